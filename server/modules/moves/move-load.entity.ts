import { Column, Entity } from 'typeorm';
import { TenantRecord } from '../../db/base-columns';
import type {
  DropPlacement,
  PreRollCheck,
  StopColonyCount,
  StopPalletCount,
} from '../../../shared/schemas/moves';

/** One truck's part of a move: planned and recorded counts. */
@Entity('move_loads')
export class MoveLoad extends TenantRecord {
  @Column({ type: 'uuid' }) moveId: string;
  @Column({ type: 'uuid' }) truckId: string;
  /** Fill order of the trucks (the load plan fills them in this order). */
  @Column({ type: 'integer' }) position: number;
  @Column({ type: 'text', array: true }) driverNames: string[];
  @Column({ type: 'integer' }) palletsPlanned: number;
  @Column({ type: 'integer' }) coloniesPlanned: number;
  /** This truck's page of the computed plan (pick-ups, weights, times), saved with the move. */
  @Column({ type: 'jsonb', nullable: true }) plan: Record<string, unknown> | null;
  @Column({ type: 'integer', nullable: true }) palletsLoaded: number | null;
  /** The same count per pick-up stop; `palletsLoaded` is their sum when these are given. */
  @Column({ type: 'jsonb', nullable: true }) palletsByStop: StopPalletCount[] | null;
  @Column({ type: 'integer', nullable: true }) coloniesPlaced: number | null;
  @Column({ type: 'integer', nullable: true }) coloniesLeftBehind: number | null;
  /** Left behind per pick-up stop; `coloniesLeftBehind` is their sum when these are given. */
  @Column({ type: 'jsonb', nullable: true }) leftBehindByStop: StopColonyCount[] | null;
  @Column({ type: 'integer', nullable: true }) coloniesLost: number | null;
  @Column({ type: 'jsonb', nullable: true }) placements: DropPlacement[] | null;
  @Column({ type: 'jsonb', nullable: true }) preRollCheck: PreRollCheck | null;
  @Column({ type: 'text' }) notes: string;
  @Column({ type: 'integer' }) version: number;
}
