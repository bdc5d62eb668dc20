import { Column, CreateDateColumn, Entity } from 'typeorm';
import { TenantRecord } from '../../db/base-columns';
import type { PlaceKind } from '../../../shared/schemas/ledger';

/** Frames-of-bees counts from a sample of colonies at a place. */
@Entity('strength_samples')
export class StrengthSample extends TenantRecord {
  @Column({ type: 'text' }) placeKind: PlaceKind;
  @Column({ type: 'uuid' }) placeId: string;
  @Column({ type: 'uuid', nullable: true }) lotId: string | null;
  @Column({ type: 'date' }) sampledOn: string;
  @Column({ type: 'double precision', array: true }) frames: number[];
  @Column({ type: 'text' }) notes: string;
  @Column({ type: 'uuid', nullable: true }) recordedBy: string | null;
  @CreateDateColumn({ type: 'timestamptz' }) createdAt: Date;
}
