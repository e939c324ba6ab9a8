import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import { SchoolEntity } from '../../users/entities/school.entity';
import { UserEntity } from '../../users/entities/user.entity';

/** A teacher's collection of review items on one topic. */
@Entity('banks')
@Index('banks_owner_id_idx', ['ownerId'])
@Index('banks_school_id_idx', ['schoolId'])
export class BankEntity {
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
  title: string;

  @Column({ type: 'text', default: '' })
  description: string;

  @Column({ type: 'text', array: true, default: () => "'{}'" })
  tags: string[];

  /** A curriculum standard the bank reviews, e.g. "HS-PS1-7"; free text. */
  @Column({ type: 'text', nullable: true })
  standardsCode: string | null;

  @Column({ type: 'timestamptz', nullable: true })
  archivedAt: Date | null;

  @CreateDateColumn({ type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ type: 'timestamptz' })
  updatedAt: Date;
}
