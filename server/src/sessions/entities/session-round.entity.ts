import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import type { RoundStatus } from '@covalent/shared-types';
import type { CloseReason } from '../domain';
import { SessionEntity } from './session.entity';

/** One item played live. */
@Entity('session_rounds')
@Index('session_rounds_session_id_index_key', ['sessionId', 'index'], { unique: true })
export class SessionRoundEntity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'uuid' })
  sessionId: string;

  @ManyToOne(() => SessionEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'session_id' })
  session?: SessionEntity;

  @Column({ type: 'int' })
  index: number;

  /** The bank item played (no foreign key: the session keeps its own copy of the item). */
  @Column({ type: 'uuid' })
  itemId: string;

  @Column({ type: 'text' })
  status: RoundStatus;

  @Column({ type: 'timestamptz', nullable: true })
  openedAt: Date | null;

  @Column({ type: 'timestamptz', nullable: true })
  closedAt: Date | null;

  @Column({ type: 'timestamptz', nullable: true })
  revealedAt: Date | null;

  @Column({ type: 'text', nullable: true })
  closeReason: CloseReason | null;

  @CreateDateColumn({ type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ type: 'timestamptz' })
  updatedAt: Date;
}
