import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import type { ItemKey, ItemOption, ItemType } from '@covalent/shared-types';
import { MediaEntity } from '../../media/entities/media.entity';
import { BankEntity } from './bank.entity';

/** One review question of a bank. */
@Entity('items')
@Index('items_bank_id_position_idx', ['bankId', 'position'])
@Index('items_image_id_idx', ['imageId'])
export class ItemEntity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'uuid' })
  bankId: string;

  @ManyToOne(() => BankEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'bank_id' })
  bank?: BankEntity;

  /** 0-based place in the bank; kept dense by the service. */
  @Column({ type: 'int' })
  position: number;

  @Column({ type: 'text' })
  type: ItemType;

  @Column({ type: 'text' })
  prompt: string;

  @Column({ type: 'jsonb', default: () => "'[]'" })
  options: ItemOption[];

  @Column({ type: 'jsonb' })
  key: ItemKey;

  @Column({ type: 'text', default: '' })
  explanation: string;

  @Column({ type: 'text', array: true, default: () => "'{}'" })
  tags: string[];

  @Column({ type: 'uuid', nullable: true })
  imageId: string | null;

  @ManyToOne(() => MediaEntity, { onDelete: 'SET NULL' })
  @JoinColumn({ name: 'image_id' })
  image?: MediaEntity | null;

  @CreateDateColumn({ type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ type: 'timestamptz' })
  updatedAt: Date;
}
