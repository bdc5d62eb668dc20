import { Column, CreateDateColumn, Entity, UpdateDateColumn } from 'typeorm';
import { TenantRecord } from '../../db/base-columns';

/** An uploaded file kept outside the web root under a generated name. */
@Entity('documents')
export class Document extends TenantRecord {
  @Column({ type: 'text' }) kind: string;
  /** The uploader's file name, sanitised for display; never used as a path. */
  @Column({ type: 'text' }) originalName: string;
  @Column({ type: 'text' }) storedName: string;
  @Column({ type: 'text' }) contentType: string;
  @Column({ type: 'integer' }) sizeBytes: number;
  @Column({ type: 'text', nullable: true }) sha256: string | null;
  @Column({ type: 'text', nullable: true }) attachedKind: string | null;
  @Column({ type: 'uuid', nullable: true }) attachedId: string | null;
  @Column({ type: 'boolean' }) sharedWithGrower: boolean;
  @Column({ type: 'uuid', nullable: true }) uploadedBy: string | null;
  @Column({ type: 'integer' }) version: number;
  @Column({ type: 'timestamptz', nullable: true }) archivedAt: Date | null;
  @CreateDateColumn({ type: 'timestamptz' }) createdAt: Date;
  @UpdateDateColumn({ type: 'timestamptz' }) updatedAt: Date;
}
