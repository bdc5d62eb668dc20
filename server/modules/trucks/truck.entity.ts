import { Column, Entity } from 'typeorm';
import { EditableRecord } from '../../db/base-columns';

/** A truck of the fleet with its legal payload and deck. */
@Entity('trucks')
export class Truck extends EditableRecord {
  @Column({ type: 'text' }) name: string;
  @Column({ type: 'double precision' }) payloadKg: number;
  @Column({ type: 'integer' }) palletSpots: number;
  @Column({ type: 'integer' }) tiers: number;
  @Column({ type: 'double precision' }) tareKg: number;
  @Column({ type: 'double precision' }) legalGrossKg: number;
  @Column({ type: 'text' }) notes: string;
}
