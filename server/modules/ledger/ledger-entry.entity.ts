import { Column, CreateDateColumn, Entity } from 'typeorm';
import { TenantRecord } from '../../db/base-columns';
import type { LedgerKind, PlaceKind } from '../../../shared/schemas/ledger';

/** A dated change in colony counts. Entries are appended, never edited. */
@Entity('ledger_entries')
export class LedgerEntry extends TenantRecord {
  @Column({ type: 'uuid' }) lotId: string;
  @Column({ type: 'text' }) kind: LedgerKind;
  @Column({ type: 'date' }) occurredOn: string;
  @Column({ type: 'integer' }) colonies: number;
  @Column({ type: 'text', nullable: true }) fromKind: PlaceKind | null;
  @Column({ type: 'uuid', nullable: true }) fromId: string | null;
  @Column({ type: 'text', nullable: true }) toKind: PlaceKind | null;
  @Column({ type: 'uuid', nullable: true }) toId: string | null;
  @Column({ type: 'text' }) reason: string;
  @Column({ type: 'uuid', nullable: true }) moveId: string | null;
  @Column({ type: 'uuid', nullable: true }) recordedBy: string | null;
  @CreateDateColumn({ type: 'timestamptz' }) createdAt: Date;
}
