import { Column, Entity } from 'typeorm';
import { TenantRecord } from '../../db/base-columns';

/** One truck's part of a move: planned and recorded counts. */
@Entity('move_loads')
export class MoveLoad extends TenantRecord {
  @Column({ type: 'uuid' }) moveId: string;
  @Column({ type: 'uuid' }) truckId: string;
  @Column({ type: 'text', array: true }) driverNames: string[];
  @Column({ type: 'integer' }) palletsPlanned: number;
  @Column({ type: 'integer' }) coloniesPlanned: number;
  @Column({ type: 'integer', nullable: true }) palletsLoaded: number | null;
  @Column({ type: 'integer', nullable: true }) coloniesPlaced: number | null;
  @Column({ type: 'integer', nullable: true }) coloniesLost: number | null;
  @Column({ type: 'jsonb', nullable: true }) preRollCheck: Record<string, boolean> | null;
  @Column({ type: 'text' }) notes: string;
  @Column({ type: 'integer' }) version: number;
}
