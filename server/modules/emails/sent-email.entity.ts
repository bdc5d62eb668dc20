import { Column, CreateDateColumn, Entity } from 'typeorm';
import { TenantRecord } from '../../db/base-columns';

/** Where an e-mail stands: waiting in the queue, accepted by the SMTP server, or given up on. */
export type SentEmailStatus = 'queued' | 'sent' | 'failed';

/** A record of every e-mail the product sends (never its body: links in it are secrets). */
@Entity('sent_emails')
export class SentEmail extends TenantRecord {
  @Column({ type: 'text' }) recipient: string;
  @Column({ type: 'text' }) subject: string;
  @Column({ type: 'text' }) purpose: string;
  @Column({ type: 'text', nullable: true }) relatedKind: string | null;
  @Column({ type: 'uuid', nullable: true }) relatedId: string | null;
  @Column({ type: 'text' }) status: SentEmailStatus;
  @Column({ type: 'text', nullable: true }) providerMessageId: string | null;
  @Column({ type: 'integer' }) attempts: number;
  @Column({ type: 'text', nullable: true }) lastError: string | null;
  @CreateDateColumn({ type: 'timestamptz' }) createdAt: Date;
  @Column({ type: 'timestamptz', nullable: true }) sentAt: Date | null;
  @Column({ type: 'timestamptz', nullable: true }) failedAt: Date | null;
}
