import { Column, Entity } from 'typeorm';
import { TenantRecord } from '../../db/base-columns';

/** Colonies of one lot that a move takes from one yard. */
@Entity('move_origins')
export class MoveOrigin extends TenantRecord {
  @Column({ type: 'uuid' }) moveId: string;
  @Column({ type: 'uuid' }) yardId: string;
  @Column({ type: 'uuid' }) lotId: string;
  @Column({ type: 'integer' }) colonies: number;
  @Column({ type: 'integer' }) pickupOrder: number;
}
