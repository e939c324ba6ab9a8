import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import { ClassEntity } from '../../classes/entities/class.entity';
import { SessionEntity } from '../../sessions/entities/session.entity';
import { UserEntity } from '../../users/entities/user.entity';

/** A self-paced follow-up of one ended class session, opened with its own code. */
@Entity('catchups')
@Index('catchups_code_open_key', ['code'], { unique: true, where: 'closed_at IS NULL' })
@Index('catchups_session_id_idx', ['sessionId'])
@Index('catchups_class_id_idx', ['classId'])
export class CatchupEntity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'uuid' })
  sessionId: string;

  @ManyToOne(() => SessionEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'session_id' })
  session?: SessionEntity;

  @Column({ type: 'uuid' })
  classId: string;

  @ManyToOne(() => ClassEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'class_id' })
  class?: ClassEntity;

  @Column({ type: 'text' })
  code: string;

  /** Kept when the teacher's account goes: the students' progress stays. */
  @Column({ type: 'uuid', nullable: true })
  createdById: string | null;

  @ManyToOne(() => UserEntity, { onDelete: 'SET NULL' })
  @JoinColumn({ name: 'created_by_id' })
  createdBy?: UserEntity | null;

  @Column({ type: 'timestamptz', nullable: true })
  closedAt: Date | null;

  @CreateDateColumn({ type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ type: 'timestamptz' })
  updatedAt: Date;
}
