import { Column, Entity } from 'typeorm';
import { TenantRecord } from '../../db/base-columns';

/** A person to call or e-mail at a grower. */
@Entity('grower_contacts')
export class GrowerContact extends TenantRecord {
  @Column({ type: 'uuid' }) growerId: string;
  @Column({ type: 'text' }) name: string;
  @Column({ type: 'text', nullable: true }) email: string | null;
  @Column({ type: 'text', nullable: true }) phone: string | null;
  @Column({ type: 'text' }) title: string;
  @Column({ type: 'integer' }) position: number;
}
