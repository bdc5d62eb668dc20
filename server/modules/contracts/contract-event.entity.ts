import { Column, Entity } from 'typeorm';
import { TenantRecord } from '../../db/base-columns';

/** One step in a contract's history (created, proposed, confirmed, status changed …). */
@Entity('contract_events')
export class ContractEvent extends TenantRecord {
  @Column({ type: 'uuid' }) contractId: string;
  @Column({ type: 'text' }) kind: string;
  @Column({ type: 'jsonb' }) detail: Record<string, unknown>;
  @Column({ type: 'uuid', nullable: true }) actorUserId: string | null;
  @Column({ type: 'timestamptz' }) occurredAt: Date;
}
