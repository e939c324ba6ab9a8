import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import type { PairKind } from '@covalent/shared-types';
import { ClassEntity } from './class.entity';
import { RosterEntryEntity } from './roster-entry.entity';

/** Keep two roster entries apart or together when the Mixer forms teams. Stored with entryAId < entryBId. */
@Entity('pair_rules')
@Index('pair_rules_class_id_entry_a_id_entry_b_id_key', ['classId', 'entryAId', 'entryBId'], { unique: true })
@Index('pair_rules_entry_a_id_idx', ['entryAId'])
@Index('pair_rules_entry_b_id_idx', ['entryBId'])
export class PairRuleEntity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'uuid' })
  classId: string;

  @ManyToOne(() => ClassEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'class_id' })
  class?: ClassEntity;

  @Column({ type: 'text' })
  kind: PairKind;

  @Column({ type: 'uuid' })
  entryAId: string;

  @ManyToOne(() => RosterEntryEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'entry_a_id' })
  entryA?: RosterEntryEntity;

  @Column({ type: 'uuid' })
  entryBId: string;

  @ManyToOne(() => RosterEntryEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'entry_b_id' })
  entryB?: RosterEntryEntity;

  @CreateDateColumn({ type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ type: 'timestamptz' })
  updatedAt: Date;
}
