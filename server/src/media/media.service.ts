import { HttpStatus, Inject, Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { createHash, randomUUID } from 'node:crypto';
import { Repository } from 'typeorm';
import { ApiException } from '../common/api-error';
import { UserEntity } from '../users/entities/user.entity';
import { MediaEntity } from './entities/media.entity';
import { sniffImageType } from './image-sniff';
import { MEDIA_STORAGE, type MediaStorage } from './media-storage';

/** Largest image we keep: ample for a diagram on a projector, small for phones on school Wi-Fi. */
export const IMAGE_MAX_BYTES = 2 * 1024 * 1024;

const notFound = () => new ApiException(HttpStatus.NOT_FOUND, 'not_found', 'No such image.');

@Injectable()
export class MediaService {
  constructor(
    @InjectRepository(MediaEntity) private readonly media: Repository<MediaEntity>,
    @Inject(MEDIA_STORAGE) private readonly storage: MediaStorage,
  ) {}

  /** Stores an image whose type is read from its bytes; anything else is a 415. */
  async saveImage(user: UserEntity, bytes: Buffer): Promise<MediaEntity> {
    const mime = sniffImageType(bytes);
    if (!mime) {
      throw new ApiException(
        HttpStatus.UNSUPPORTED_MEDIA_TYPE,
        'unsupported_image_type',
        'That file is not a PNG, JPEG or WebP image (its contents were checked, not its name).',
      );
    }
    const id = randomUUID();
    const storageKey = `images/${id.slice(0, 2)}/${id}`;
    await this.storage.put(storageKey, bytes);
    try {
      return await this.media.save(
        this.media.create({
          id,
          ownerId: user.id,
          schoolId: user.schoolId,
          mime,
          byteSize: bytes.length,
          sha256: createHash('sha256').update(bytes).digest('hex'),
          storageKey,
        }),
      );
    } catch (err) {
      await this.storage.delete(storageKey);
      throw err;
    }
  }

  /**
   * An image the user may see: their own, one used by an item of a bank they own or have a share
   * of, or (for an admin) any of their school's. Everything else is a 404, like a missing image.
   */
  async imageFor(user: UserEntity, id: string): Promise<{ media: MediaEntity; bytes: Buffer }> {
    const media = await this.media.findOne({ where: { id, schoolId: user.schoolId } });
    if (!media || !(await this.canSee(user, media))) throw notFound();
    const bytes = await this.storage.get(media.storageKey);
    if (!bytes) throw notFound();
    return { media, bytes };
  }

  /** An image by id alone, for routes that have already proved the caller may see it. */
  async imageById(id: string): Promise<{ media: MediaEntity; bytes: Buffer }> {
    const media = await this.media.findOne({ where: { id } });
    const bytes = media ? await this.storage.get(media.storageKey) : null;
    if (!media || !bytes) throw notFound();
    return { media, bytes };
  }

  /** Whether the user may attach this image to an item: it must be an image of their school. */
  async isUsableBy(user: UserEntity, id: string): Promise<boolean> {
    return this.media.exists({ where: { id, schoolId: user.schoolId } });
  }

  private async canSee(user: UserEntity, media: MediaEntity): Promise<boolean> {
    if (media.ownerId === user.id || user.role === 'admin') return true;
    const rows: unknown[] = await this.media.query(
      `SELECT 1 FROM items i
         JOIN banks b ON b.id = i.bank_id
         LEFT JOIN bank_shares s ON s.bank_id = b.id AND s.user_id = $2
        WHERE i.image_id = $1 AND (b.owner_id = $2 OR s.id IS NOT NULL)
        LIMIT 1`,
      [media.id, user.id],
    );
    return rows.length > 0;
  }
}
