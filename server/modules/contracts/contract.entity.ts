import { Column, Entity } from 'typeorm';
import { EditableRecord } from '../../db/base-columns';
import type { ContractStatus } from '../../../shared/schemas/contracts';

/** A grower's order of colonies of a minimum strength for a bloom, at a fee per colony. */
@Entity('contracts')
export class Contract extends EditableRecord {
  @Column({ type: 'uuid' }) growerId: string;
  @Column({ type: 'uuid', array: true }) siteIds: string[];
  @Column({ type: 'text' }) crop: string;
  @Column({ type: 'integer' }) season: number;
  @Column({ type: 'text' }) status: ContractStatus;
  @Column({ type: 'integer' }) coloniesOrdered: number;
  @Column({ type: 'double precision' }) minFrames: number;
  @Column({ type: 'double precision', nullable: true }) averageFrames: number | null;
  @Column({ type: 'integer' }) feePerColonyCents: number;
  @Column({ type: 'integer' }) depositCents: number;
  @Column({ type: 'integer' }) frameAdjustmentCents: number;
  @Column({ type: 'date' }) deliveryStartOn: string;
  @Column({ type: 'date' }) deliveryEndOn: string;
  @Column({ type: 'date', nullable: true }) removalOn: string | null;
  @Column({ type: 'integer' }) sprayNoticeHours: number;
  @Column({ type: 'text' }) terms: string;
  @Column({ type: 'text' }) internalNotes: string;
}
