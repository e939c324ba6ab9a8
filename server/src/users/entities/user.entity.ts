import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import type { Role } from '@covalent/shared-types';
import { SchoolEntity } from './school.entity';

/** A teacher or an administrator. Players (students) never have a row here. */
@Entity('users')
@Index('users_email_key', ['email'], { unique: true })
@Index('users_school_id_idx', ['schoolId'])
export class UserEntity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  /** Stored lower-cased. */
  @Column({ type: 'text' })
  email: string;

  @Column({ type: 'text' })
  displayName: string;

  @Column({ type: 'text' })
  role: Role;

  @Column({ type: 'uuid' })
  schoolId: string;

  @ManyToOne(() => SchoolEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'school_id' })
  school?: SchoolEntity;

  /** argon2id hash; null until an invited teacher sets a password. */
  @Column({ type: 'text', nullable: true })
  passwordHash: string | null;

  /** Deactivated users cannot sign in; their classes and banks stay. */
  @Column({ type: 'boolean', default: true })
  active: boolean;

  @CreateDateColumn({ type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ type: 'timestamptz' })
  updatedAt: Date;
}
