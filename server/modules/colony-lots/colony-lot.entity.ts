import { Column, Entity } from 'typeorm';
import { EditableRecord } from '../../db/base-columns';

/** A group of colonies kept alike (box setup, pallet type); its counts live in the ledger. */
@Entity('colony_lots')
export class ColonyLot extends EditableRecord {
  @Column({ type: 'text' }) name: string;
  @Column({ type: 'uuid' }) hiveSetupId: string;
  @Column({ type: 'integer' }) coloniesPerPallet: number;
  @Column({ type: 'text' }) queenStatus: string;
  @Column({ type: 'double precision', nullable: true }) meanFrames: number | null;
  @Column({ type: 'text' }) notes: string;
}
