import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import type { Format, ItemContent, MixerMode, MixerSummary, NamePack, SessionStatus, StandingsView } from '@covalent/shared-types';
import { BankEntity } from '../../banks/entities/bank.entity';
import { ClassEntity } from '../../classes/entities/class.entity';
import { SchoolEntity } from '../../users/entities/school.entity';
import { UserEntity } from '../../users/entities/user.entity';
import type { StoredSnapshot } from '../live/snapshot-codec';

/** What the teacher chose when setting the session up. */
export interface SessionSettings {
  roundSeconds: number;
  speedWeight: number;
  standings: StandingsView;
  teamCount: number | null;
  targetTeamSize: number | null;
  mixerMode: MixerMode;
  namePack: NamePack;
}

/** An item as played: a copy taken at setup, so later edits to the bank do not change a session. */
export interface SessionItem extends ItemContent {
  id: string;
}

/** One live game run from a bank. The engine snapshot plus the responses after it rebuild a live session. */
@Entity('sessions')
@Index('sessions_join_code_live_key', ['joinCode'], { unique: true, where: "status <> 'ended'" })
@Index('sessions_owner_id_idx', ['ownerId'])
@Index('sessions_class_id_idx', ['classId'])
@Index('sessions_school_id_idx', ['schoolId'])
@Index('sessions_status_idx', ['status'])
export class SessionEntity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'uuid' })
  ownerId: string;

  @ManyToOne(() => UserEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'owner_id' })
  owner?: UserEntity;

  @Column({ type: 'uuid' })
  schoolId: string;

  @ManyToOne(() => SchoolEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'school_id' })
  school?: SchoolEntity;

  /** Kept when the bank is deleted later: the session's results stay readable. */
  @Column({ type: 'uuid', nullable: true })
  bankId: string | null;

  @ManyToOne(() => BankEntity, { onDelete: 'SET NULL' })
  @JoinColumn({ name: 'bank_id' })
  bank?: BankEntity | null;

  @Column({ type: 'text' })
  bankTitle: string;

  /** Deleting a class deletes its sessions and their student data. */
  @Column({ type: 'uuid', nullable: true })
  classId: string | null;

  @ManyToOne(() => ClassEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'class_id' })
  class?: ClassEntity | null;

  @Column({ type: 'text' })
  joinCode: string;

  @Column({ type: 'text' })
  status: SessionStatus;

  @Column({ type: 'text' })
  format: Format;

  @Column({ type: 'jsonb' })
  settings: SessionSettings;

  @Column({ type: 'uuid', array: true })
  itemIds: string[];

  @Column({ type: 'jsonb' })
  items: SessionItem[];

  /** Seeds the engine's random source (numbered calls) and the order-step shuffles. */
  @Column({ type: 'text' })
  seed: string;

  @Column({ type: 'text', nullable: true })
  mixerSeed: string | null;

  @Column({ type: 'jsonb', nullable: true })
  mixerSummary: MixerSummary | null;

  @Column({ type: 'boolean', default: false })
  joiningLocked: boolean;

  @Column({ type: 'jsonb' })
  /** The engine's SessionState as stored (see snapshot-codec). */
  snapshot: StoredSnapshot;

  @Column({ type: 'int', default: 1 })
  snapshotVersion: number;

  /** Highest responses.seq already inside the snapshot; later rows are replayed on restore. */
  @Column({ type: 'bigint', default: 0 })
  snapshotSeq: string;

  @Column({ type: 'timestamptz', nullable: true })
  snapshotAt: Date | null;

  @Column({ type: 'timestamptz', nullable: true })
  startedAt: Date | null;

  @Column({ type: 'timestamptz', nullable: true })
  endedAt: Date | null;

  @CreateDateColumn({ type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ type: 'timestamptz' })
  updatedAt: Date;
}
