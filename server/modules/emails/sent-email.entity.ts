import { Column, CreateDateColumn, Entity } from 'typeorm';
import { TenantRecord } from '../../db/base-columns';

/** A record of every e-mail the product sends. */
@Entity('sent_emails')
export class SentEmail extends TenantRecord {
  @Column({ type: 'text' }) recipient: string;
  @Column({ type: 'text' }) subject: string;
  @Column({ type: 'text' }) purpose: string;
  @Column({ type: 'text', nullable: true }) relatedKind: string | null;
  @Column({ type: 'uuid', nullable: true }) relatedId: string | null;
  @Column({ type: 'text' }) status: string;
  @Column({ type: 'text', nullable: true }) providerMessageId: string | null;
  @CreateDateColumn({ type: 'timestamptz' }) createdAt: Date;
  @Column({ type: 'timestamptz', nullable: true }) sentAt: Date | null;
}
