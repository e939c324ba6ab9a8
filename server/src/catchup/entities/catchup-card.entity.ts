import { Check, Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import type { CatchupBox } from '@covalent/shared-types';
import { RosterEntryEntity } from '../../classes/entities/roster-entry.entity';
import { CatchupEntity } from './catchup.entity';

/** One student's Leitner card for one missed item. */
@Entity('catchup_cards')
@Index('catchup_cards_catchup_id_roster_entry_id_item_id_key', ['catchupId', 'rosterEntryId', 'itemId'], { unique: true })
@Index('catchup_cards_roster_entry_id_idx', ['rosterEntryId'])
@Check('catchup_cards_box_check', 'box BETWEEN 1 AND 5')
export class CatchupCardEntity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'uuid' })
  catchupId: string;

  @ManyToOne(() => CatchupEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'catchup_id' })
  catchup?: CatchupEntity;

  @Column({ type: 'uuid' })
  rosterEntryId: string;

  @ManyToOne(() => RosterEntryEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'roster_entry_id' })
  rosterEntry?: RosterEntryEntity;

  /** The session's copy of the item (no foreign key: sessions keep their own item content). */
  @Column({ type: 'uuid' })
  itemId: string;

  @Column({ type: 'int', default: 1 })
  box: CatchupBox;

  @Column({ type: 'timestamptz' })
  dueAt: Date;

  @Column({ type: 'timestamptz', nullable: true })
  lastAnsweredAt: Date | null;

  @CreateDateColumn({ type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ type: 'timestamptz' })
  updatedAt: Date;
}
