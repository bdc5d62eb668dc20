import {
  Column,
  CreateDateColumn,
  Entity,
  PrimaryGeneratedColumn,
  UpdateDateColumn,
} from 'typeorm';
import type { Role, Units } from '../../../shared/schemas/users';

/** A person who signs in: owner, planner, crew or grower (a grower user belongs to one grower). */
@Entity('users')
export class User {
  @PrimaryGeneratedColumn('uuid') id: string;
  @Column({ type: 'uuid' }) operationId: string;
  @Column({ type: 'text' }) email: string;
  @Column({ type: 'text' }) name: string;
  @Column({ type: 'text' }) role: Role;
  @Column({ type: 'uuid', nullable: true }) growerId: string | null;
  @Column({ type: 'text', select: false }) passwordHash: string;
  @Column({ type: 'text' }) units: Units;
  @Column({ type: 'boolean' }) active: boolean;
  @Column({ type: 'integer' }) version: number;
  @CreateDateColumn({ type: 'timestamptz' }) createdAt: Date;
  @UpdateDateColumn({ type: 'timestamptz' }) updatedAt: Date;
}
