import { Column, Entity } from 'typeorm';
import { EditableRecord } from '../../db/base-columns';
import type {
  InvoiceBasis,
  InvoiceKind,
  InvoiceLineItem,
  InvoiceStatus,
} from '../../../shared/schemas/invoices';

/** A bill to a grower for a contract: deposit, balance or adjustment. */
@Entity('invoices')
export class Invoice extends EditableRecord {
  @Column({ type: 'uuid' }) contractId: string;
  @Column({ type: 'uuid' }) growerId: string;
  @Column({ type: 'integer' }) number: number;
  @Column({ type: 'text' }) kind: InvoiceKind;
  @Column({ type: 'text' }) status: InvoiceStatus;
  @Column({ type: 'jsonb' }) lines: InvoiceLineItem[];
  @Column({ type: 'integer' }) amountCents: number;
  @Column({ type: 'date', nullable: true }) issuedOn: string | null;
  @Column({ type: 'date', nullable: true }) dueOn: string | null;
  /** The figures the lines were computed from (colonies placed, strength sample). */
  @Column({ type: 'jsonb' }) basis: InvoiceBasis;
  /** The operation's own notes; never shown to the grower. */
  @Column({ type: 'text' }) internalNotes: string;
  @Column({ type: 'timestamptz', nullable: true }) paidAt: Date | null;
  @Column({ type: 'timestamptz', nullable: true }) voidedAt: Date | null;
}
