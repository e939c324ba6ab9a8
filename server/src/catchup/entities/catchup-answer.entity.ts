import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import type { ItemResponse } from '@covalent/shared-types';
import { CatchupCardEntity } from './catchup-card.entity';

/** Every catch-up attempt, kept for the teacher's results. */
@Entity('catchup_answers')
@Index('catchup_answers_card_id_answered_at_idx', ['cardId', 'answeredAt'])
export class CatchupAnswerEntity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'uuid' })
  cardId: string;

  @ManyToOne(() => CatchupCardEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'card_id' })
  card?: CatchupCardEntity;

  @Column({ type: 'jsonb' })
  response: ItemResponse;

  @Column({ type: 'double precision' })
  credit: number;

  @Column({ type: 'boolean' })
  correct: boolean;

  @Column({ type: 'timestamptz' })
  answeredAt: Date;

  @CreateDateColumn({ type: 'timestamptz' })
  createdAt: Date;
}
