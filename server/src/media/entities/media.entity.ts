import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import { SchoolEntity } from '../../users/entities/school.entity';
import { UserEntity } from '../../users/entities/user.entity';
import type { ImageMime } from '../image-sniff';

/** An uploaded image. The bytes live in MediaStorage under `storageKey`. */
@Entity('media')
@Index('media_owner_id_idx', ['ownerId'])
@Index('media_school_id_idx', ['schoolId'])
export class MediaEntity {
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

  /** Sniffed from the bytes, never taken from the upload's name or declared type. */
  @Column({ type: 'text' })
  mime: ImageMime;

  @Column({ type: 'int' })
  byteSize: number;

  /** Hex SHA-256 of the bytes. */
  @Column({ type: 'text' })
  sha256: string;

  @Column({ type: 'text' })
  storageKey: string;

  @CreateDateColumn({ type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ type: 'timestamptz' })
  updatedAt: Date;
}
