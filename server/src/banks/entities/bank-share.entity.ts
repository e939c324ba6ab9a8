import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import type { ShareAccess } from '@covalent/shared-types';
import { UserEntity } from '../../users/entities/user.entity';
import { BankEntity } from './bank.entity';

/** A bank shared with a co-teacher of the same school. */
@Entity('bank_shares')
@Index('bank_shares_bank_id_user_id_key', ['bankId', 'userId'], { unique: true })
@Index('bank_shares_user_id_idx', ['userId'])
export class BankShareEntity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'uuid' })
  bankId: string;

  @ManyToOne(() => BankEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'bank_id' })
  bank?: BankEntity;

  @Column({ type: 'uuid' })
  userId: string;

  @ManyToOne(() => UserEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'user_id' })
  user?: UserEntity;

  @Column({ type: 'text' })
  access: ShareAccess;

  @CreateDateColumn({ type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ type: 'timestamptz' })
  updatedAt: Date;
}
