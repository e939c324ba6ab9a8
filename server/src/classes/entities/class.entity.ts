import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import { SchoolEntity } from '../../users/entities/school.entity';
import { UserEntity } from '../../users/entities/user.entity';

/** A class period/section with a roster. */
@Entity('classes')
@Index('classes_owner_id_idx', ['ownerId'])
@Index('classes_school_id_idx', ['schoolId'])
export class ClassEntity {
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

  @Column({ type: 'text' })
  name: string;

  /** "3" or "B-block": schools name periods their own way. */
  @Column({ type: 'text', default: '' })
  period: string;

  /** "Fall 2031", "T2". */
  @Column({ type: 'text', default: '' })
  term: string;

  @Column({ type: 'timestamptz', nullable: true })
  archivedAt: Date | null;

  @CreateDateColumn({ type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ type: 'timestamptz' })
  updatedAt: Date;
}
