import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import type { PlayerStatus } from '@covalent/shared-types';
import { RosterEntryEntity } from '../../classes/entities/roster-entry.entity';
import { SessionEntity } from './session.entity';
import { SessionTeamEntity } from './session-team.entity';

/** A student in one session: a nickname or a roster pick, never an account. */
@Entity('session_players')
@Index('session_players_session_id_nickname_key', ['sessionId', 'nicknameKey'], { unique: true, where: 'removed_at IS NULL' })
@Index('session_players_session_id_roster_entry_id_key', ['sessionId', 'rosterEntryId'], {
  unique: true,
  where: 'removed_at IS NULL AND roster_entry_id IS NOT NULL',
})
@Index('session_players_roster_entry_id_idx', ['rosterEntryId'])
@Index('session_players_team_id_idx', ['teamId'])
export class SessionPlayerEntity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'uuid' })
  sessionId: string;

  @ManyToOne(() => SessionEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'session_id' })
  session?: SessionEntity;

  @Column({ type: 'text' })
  nickname: string;

  /** Lower-cased, NFKC-normalised nickname: unique among the session's players. */
  @Column({ type: 'text' })
  nicknameKey: string;

  @Column({ type: 'uuid', nullable: true })
  rosterEntryId: string | null;

  @ManyToOne(() => RosterEntryEntity, { onDelete: 'SET NULL' })
  @JoinColumn({ name: 'roster_entry_id' })
  rosterEntry?: RosterEntryEntity | null;

  /** Copied from the roster at join, for the Mixer. */
  @Column({ type: 'text', nullable: true })
  tableGroup: string | null;

  @Column({ type: 'double precision', default: 1 })
  timeMultiplier: number;

  @Column({ type: 'uuid', nullable: true })
  teamId: string | null;

  @ManyToOne(() => SessionTeamEntity, { onDelete: 'SET NULL' })
  @JoinColumn({ name: 'team_id' })
  team?: SessionTeamEntity | null;

  @Column({ type: 'int', nullable: true })
  number: number | null;

  @Column({ type: 'text' })
  status: PlayerStatus;

  @Column({ type: 'timestamptz', nullable: true })
  removedAt: Date | null;

  /** Part of the signed player token; bumped on removal so old tokens stop working. */
  @Column({ type: 'int', default: 1 })
  tokenVersion: number;

  @CreateDateColumn({ type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ type: 'timestamptz' })
  updatedAt: Date;
}
