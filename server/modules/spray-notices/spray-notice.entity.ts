import { Column, Entity } from 'typeorm';
import { EditableRecord } from '../../db/base-columns';

/** A grower's planned pesticide application at a site, and what the beekeeper did about it. */
@Entity('spray_notices')
export class SprayNotice extends EditableRecord {
  @Column({ type: 'uuid' }) growerId: string;
  @Column({ type: 'uuid' }) siteId: string;
  @Column({ type: 'timestamptz' }) startsAt: Date;
  @Column({ type: 'timestamptz' }) endsAt: Date;
  @Column({ type: 'text' }) product: string;
  @Column({ type: 'text' }) notes: string;
  @Column({ type: 'text' }) status: string;
  @Column({ type: 'text', nullable: true }) action: string | null;
  @Column({ type: 'text' }) actionNote: string;
  @Column({ type: 'uuid', nullable: true }) filedBy: string | null;
  @Column({ type: 'uuid', nullable: true }) acknowledgedBy: string | null;
  @Column({ type: 'timestamptz', nullable: true }) acknowledgedAt: Date | null;
}
