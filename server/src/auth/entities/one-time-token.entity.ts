import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { UserEntity } from '../../users/entities/user.entity';

export const ONE_TIME_PURPOSES = ['invite', 'reset'] as const;
export type OneTimePurpose = (typeof ONE_TIME_PURPOSES)[number];

/** A single-use, expiring link token (invitation or password reset). Only its SHA-256 is stored. */
@Entity('one_time_tokens')
@Index('one_time_tokens_token_hash_key', ['tokenHash'], { unique: true })
@Index('one_time_tokens_user_id_idx', ['userId'])
export class OneTimeTokenEntity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'text' })
  tokenHash: string;

  @Column({ type: 'text' })
  purpose: OneTimePurpose;

  @Column({ type: 'uuid' })
  userId: string;

  @ManyToOne(() => UserEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'user_id' })
  user?: UserEntity;

  @Column({ type: 'timestamptz' })
  expiresAt: Date;

  @Column({ type: 'timestamptz', nullable: true })
  usedAt: Date | null;

  @CreateDateColumn({ type: 'timestamptz' })
  createdAt: Date;
}
