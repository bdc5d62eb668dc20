import { Column, Entity } from 'typeorm';
import { EditableRecord } from '../../db/base-columns';

/** A bill to a grower for a contract: deposit, balance or adjustment. */
@Entity('invoices')
export class Invoice extends EditableRecord {
  @Column({ type: 'uuid' }) contractId: string;
  @Column({ type: 'uuid' }) growerId: string;
  @Column({ type: 'integer' }) number: number;
  @Column({ type: 'text' }) kind: 'deposit' | 'balance' | 'adjustment';
  @Column({ type: 'text' }) status: string;
  @Column({ type: 'jsonb' }) lines: Array<{ description: string; amountCents: number }>;
  @Column({ type: 'integer' }) amountCents: number;
  @Column({ type: 'date', nullable: true }) issuedOn: string | null;
  @Column({ type: 'date', nullable: true }) dueOn: string | null;
}
