import { Column, Entity } from 'typeorm';
import { EditableRecord } from '../../db/base-columns';

/** A customer who rents colonies (or a landowner of a honey location). */
@Entity('growers')
export class Grower extends EditableRecord {
  @Column({ type: 'text' }) name: string;
  @Column({ type: 'text' }) billingAddress: string;
  @Column({ type: 'text' }) internalNotes: string;
}
