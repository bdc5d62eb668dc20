import { Column, Entity } from 'typeorm';
import { EditableRecord } from '../../db/base-columns';

/** A holding location owned or leased by the operation. */
@Entity('yards')
export class Yard extends EditableRecord {
  @Column({ type: 'text' }) name: string;
  @Column({ type: 'double precision' }) latitude: number;
  @Column({ type: 'double precision' }) longitude: number;
  @Column({ type: 'integer' }) capacity: number;
  @Column({ type: 'text' }) accessNotes: string;
  @Column({ type: 'text' }) notes: string;
  @Column({ type: 'date', nullable: true }) lastVisitOn: string | null;
}
