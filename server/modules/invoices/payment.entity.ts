import { Column, Entity } from 'typeorm';
import { TenantRecord } from '../../db/base-columns';

/** Money received against an invoice, keyed by the payment provider's reference. */
@Entity('payments')
export class Payment extends TenantRecord {
  @Column({ type: 'uuid' }) invoiceId: string;
  @Column({ type: 'integer' }) amountCents: number;
  @Column({ type: 'text' }) providerReference: string;
  /** The hosted checkout session the money came through. */
  @Column({ type: 'text', nullable: true }) providerSessionId: string | null;
  @Column({ type: 'timestamptz' }) receivedAt: Date;
}
