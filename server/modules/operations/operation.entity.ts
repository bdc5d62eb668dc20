import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';

/** A beekeeping business: the tenant every record belongs to. */
@Entity('operations')
export class Operation {
  @PrimaryGeneratedColumn('uuid') id: string;
  @Column({ type: 'text' }) name: string;
  @CreateDateColumn({ type: 'timestamptz' }) createdAt: Date;
}
