import { Column, Entity } from 'typeorm';
import { EditableRecord } from '../../db/base-columns';
import type { MoveStatus } from '../../../shared/schemas/moves';
import type { PlaceKind } from '../../../shared/schemas/ledger';

/** One night's (or several nights') haul of colonies from yards to a destination. */
@Entity('moves')
export class Move extends EditableRecord {
  @Column({ type: 'text' }) name: string;
  @Column({ type: 'date' }) nightOf: string;
  @Column({ type: 'text' }) status: MoveStatus;
  @Column({ type: 'text' }) destinationKind: PlaceKind;
  @Column({ type: 'uuid', array: true }) destinationIds: string[];
  @Column({ type: 'uuid', nullable: true }) contractId: string | null;
  @Column({ type: 'integer' }) drivers: 1 | 2;
  @Column({ type: 'integer' }) loadingMinutes: number;
  @Column({ type: 'double precision' }) averageSpeedKmh: number;
  @Column({ type: 'jsonb', nullable: true }) timeline: Record<string, unknown> | null;
  @Column({ type: 'text' }) notes: string;
}
