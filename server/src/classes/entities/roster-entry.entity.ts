import { Check, Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import type { TimeMultiplier } from '@covalent/shared-types';
import { ClassEntity } from './class.entity';

/** PostgreSQL returns numeric as a string; the multipliers are exact in binary (1, 1.25, 1.5, 2). */
const numericToNumber = {
  to: (value: number | null | undefined) => value,
  from: (value: string | null) => (value === null ? null : Number(value)),
};

/** A student in a class. No e-mail, no account: a display name the class recognises. */
@Entity('roster_entries')
@Index('roster_entries_class_id_display_name_key', ['classId', 'displayName'], { unique: true })
@Check('roster_entries_time_multiplier_check', 'time_multiplier IN (1, 1.25, 1.5, 2)')
export class RosterEntryEntity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'uuid' })
  classId: string;

  @ManyToOne(() => ClassEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'class_id' })
  class?: ClassEntity;

  @Column({ type: 'text' })
  displayName: string;

  @Column({ type: 'text', nullable: true })
  tableGroup: string | null;

  @Column({ type: 'int', nullable: true })
  seatNumber: number | null;

  @Column({ type: 'numeric', precision: 3, scale: 2, default: 1, transformer: numericToNumber })
  timeMultiplier: TimeMultiplier;

  @CreateDateColumn({ type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ type: 'timestamptz' })
  updatedAt: Date;
}
