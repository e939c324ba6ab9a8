import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import type { TeamPattern } from '@covalent/shared-types';
import { SessionEntity } from './session.entity';

/** A team of a session, told apart by name, colour and pattern. */
@Entity('session_teams')
@Index('session_teams_session_id_position_key', ['sessionId', 'position'], { unique: true })
export class SessionTeamEntity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'uuid' })
  sessionId: string;

  @ManyToOne(() => SessionEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'session_id' })
  session?: SessionEntity;

  @Column({ type: 'int' })
  position: number;

  @Column({ type: 'text' })
  name: string;

  @Column({ type: 'text' })
  colour: string;

  @Column({ type: 'text' })
  pattern: TeamPattern;

  @CreateDateColumn({ type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ type: 'timestamptz' })
  updatedAt: Date;
}
