import { Column, Entity } from 'typeorm';
import { EditableRecord } from '../../db/base-columns';
import type { HiveBox } from '../../../shared/schemas/hive-setups';

/** A stack of boxes with their honey fill: gives a hive weight. */
@Entity('hive_setups')
export class HiveSetup extends EditableRecord {
  @Column({ type: 'text' }) name: string;
  @Column({ type: 'jsonb' }) boxes: HiveBox[];
}
