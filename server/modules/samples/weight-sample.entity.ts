import { Column, CreateDateColumn, Entity } from 'typeorm';
import { TenantRecord } from '../../db/base-columns';

/** Hive weights read off a scale at a yard or during loading. */
@Entity('weight_samples')
export class WeightSample extends TenantRecord {
  @Column({ type: 'uuid', nullable: true }) yardId: string | null;
  @Column({ type: 'uuid', nullable: true }) lotId: string | null;
  @Column({ type: 'uuid', nullable: true }) moveId: string | null;
  @Column({ type: 'date' }) sampledOn: string;
  @Column({ type: 'double precision', array: true }) weightsKg: number[];
  @Column({ type: 'text' }) notes: string;
  @Column({ type: 'uuid', nullable: true }) recordedBy: string | null;
  @CreateDateColumn({ type: 'timestamptz' }) createdAt: Date;
}
