import { Column, CreateDateColumn, Entity, Generated, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import type { ItemResponse } from '@covalent/shared-types';
import { SessionEntity } from './session.entity';
import { SessionPlayerEntity } from './session-player.entity';

/** `answer`: a submitted answer or huddle vote; `lock`: a huddle vote locked in without change. */
export type ResponseKind = 'answer' | 'lock';

/**
 * Every accepted answer, stored before it is acknowledged. The unique
 * (player, client message id) pair is what makes a resend count once.
 */
@Entity('responses')
@Index('responses_player_id_client_message_id_key', ['playerId', 'clientMessageId'], { unique: true })
@Index('responses_session_id_seq_idx', ['sessionId', 'seq'])
@Index('responses_session_id_round_index_idx', ['sessionId', 'roundIndex'])
export class ResponseEntity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  /** Arrival order within the server; replay on restore follows it. */
  @Column({ type: 'bigint' })
  @Generated('increment')
  seq: string;

  @Column({ type: 'uuid' })
  sessionId: string;

  @ManyToOne(() => SessionEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'session_id' })
  session?: SessionEntity;

  @Column({ type: 'int' })
  roundIndex: number;

  @Column({ type: 'uuid' })
  playerId: string;

  @ManyToOne(() => SessionPlayerEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'player_id' })
  player?: SessionPlayerEntity;

  @Column({ type: 'uuid', nullable: true })
  teamId: string | null;

  @Column({ type: 'text' })
  clientMessageId: string;

  @Column({ type: 'text', default: 'answer' })
  kind: ResponseKind;

  @Column({ type: 'jsonb', nullable: true })
  response: ItemResponse | null;

  @Column({ type: 'boolean', default: false })
  locked: boolean;

  /** Null until the round's results are stored (at the reveal, or at the end for unrevealed rounds). */
  @Column({ type: 'double precision', nullable: true })
  credit: number | null;

  @Column({ type: 'boolean', nullable: true })
  correct: boolean | null;

  @Column({ type: 'int', nullable: true })
  points: number | null;

  /** The player's answer that counted in the round (a huddle's last vote). */
  @Column({ type: 'boolean', default: false })
  final: boolean;

  @Column({ type: 'int' })
  elapsedMs: number;

  @Column({ type: 'timestamptz' })
  receivedAt: Date;

  @CreateDateColumn({ type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ type: 'timestamptz' })
  updatedAt: Date;
}
