import { Column, CreateDateColumn, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';

/** Columns every tenant-owned record has. */
export abstract class TenantRecord {
  @PrimaryGeneratedColumn('uuid') id: string;
  @Column({ type: 'uuid' }) operationId: string;
}

/** Columns of records that users edit: a version checked on update, archiving instead of delete. */
export abstract class EditableRecord extends TenantRecord {
  @Column({ type: 'integer' }) version: number;
  @Column({ type: 'timestamptz', nullable: true }) archivedAt: Date | null;
  @CreateDateColumn({ type: 'timestamptz' }) createdAt: Date;
  @UpdateDateColumn({ type: 'timestamptz' }) updatedAt: Date;
}
