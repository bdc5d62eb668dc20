import { SeasonRecords1764640000000 } from './1764640000000-season-records';
import { GrowerCorrespondence1796180200000 } from './1796180200000-grower-correspondence';
import { MovePlansAndFeeds1796190000000 } from './1796190000000-move-plans-and-feeds';
import { InvoicePayments1796200000000 } from './1796200000000-invoice-payments';
import { PalletsByStop1796210000000 } from './1796210000000-pallets-by-stop';
import { ColonyBalances1796220000000 } from './1796220000000-colony-balances';
import { LeftBehindByStop1796230000000 } from './1796230000000-left-behind-by-stop';

/** Migrations in the order they run. */
export const migrations = [
  SeasonRecords1764640000000,
  GrowerCorrespondence1796180200000,
  MovePlansAndFeeds1796190000000,
  InvoicePayments1796200000000,
  PalletsByStop1796210000000,
  ColonyBalances1796220000000,
  LeftBehindByStop1796230000000,
];
