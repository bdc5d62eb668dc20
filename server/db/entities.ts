import { Operation } from '../modules/operations/operation.entity';
import { User } from '../modules/users/user.entity';
import { Grower } from '../modules/growers/grower.entity';
import { GrowerContact } from '../modules/growers/grower-contact.entity';
import { Yard } from '../modules/yards/yard.entity';
import { Site } from '../modules/sites/site.entity';
import { HiveSetup } from '../modules/hive-setups/hive-setup.entity';
import { Contract } from '../modules/contracts/contract.entity';
import { ContractEvent } from '../modules/contracts/contract-event.entity';
import { ColonyLot } from '../modules/colony-lots/colony-lot.entity';
import { LedgerEntry } from '../modules/ledger/ledger-entry.entity';
import { Truck } from '../modules/trucks/truck.entity';
import { Move } from '../modules/moves/move.entity';
import { MoveOrigin } from '../modules/moves/move-origin.entity';
import { MoveLoad } from '../modules/moves/move-load.entity';
import { WeightSample } from '../modules/samples/weight-sample.entity';
import { StrengthSample } from '../modules/samples/strength-sample.entity';
import { SprayNotice } from '../modules/spray-notices/spray-notice.entity';
import { Invoice } from '../modules/invoices/invoice.entity';
import { Payment } from '../modules/invoices/payment.entity';
import { Document } from '../modules/documents/document.entity';
import { SentEmail } from '../modules/emails/sent-email.entity';

/** Every TypeORM entity, for the data source. */
export const entities = [
  Operation,
  User,
  Grower,
  GrowerContact,
  Yard,
  Site,
  HiveSetup,
  Contract,
  ContractEvent,
  ColonyLot,
  LedgerEntry,
  Truck,
  Move,
  MoveOrigin,
  MoveLoad,
  WeightSample,
  StrengthSample,
  SprayNotice,
  Invoice,
  Payment,
  Document,
  SentEmail,
];
