import { HttpStatus, Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { ItemContent, ItemDto } from '@covalent/shared-types';
import { randomUUID } from 'node:crypto';
import { DataSource } from 'typeorm';
import { ApiException } from '../common/api-error';
import { MediaService } from '../media/media.service';
import { type FieldError, validateItemContent } from '../scoring/domain/answer-check';
import { UserEntity } from '../users/entities/user.entity';
import { toItemDto } from './banks.mapper';
import { BanksService } from './banks.service';
import { ItemInputDto } from './dto/item.dto';
import { ItemEntity } from './entities/item.entity';
import { buildItemContent } from './item-content';

/** Most items one bank holds; a session plays a handful, a term's review a few dozen. */
export const BANK_MAX_ITEMS = 1000;

const itemNotFound = () => new ApiException(HttpStatus.NOT_FOUND, 'not_found', 'No such item in this bank.');

function refuse(errors: FieldError[]): never {
  throw new ApiException(
    HttpStatus.BAD_REQUEST,
    'validation_failed',
    errors.length === 1 ? errors[0].message : `${errors.length} fields need attention.`,
    errors,
  );
}

@Injectable()
export class ItemsService {
  constructor(
    @InjectDataSource() private readonly db: DataSource,
    private readonly banks: BanksService,
    private readonly media: MediaService,
  ) {}

  async list(user: UserEntity, bankId: string): Promise<ItemDto[]> {
    await this.banks.access(user, bankId, 'read');
    const items = await this.db.getRepository(ItemEntity).find({ where: { bankId }, order: { position: 'ASC' } });
    return items.map(toItemDto);
  }

  async get(user: UserEntity, bankId: string, itemId: string): Promise<ItemDto> {
    await this.banks.access(user, bankId, 'read');
    return toItemDto(await this.load(bankId, itemId));
  }

  async create(user: UserEntity, bankId: string, input: ItemInputDto): Promise<ItemDto> {
    await this.banks.access(user, bankId, 'edit');
    const content = await this.checked(user, input);
    const id = await this.db.transaction(async (manager) => {
      // Serialise appends to one bank so positions stay dense.
      await manager.query('SELECT id FROM banks WHERE id = $1 FOR UPDATE', [bankId]);
      const repo = manager.getRepository(ItemEntity);
      const count = await repo.count({ where: { bankId } });
      if (count >= BANK_MAX_ITEMS) {
        throw new ApiException(HttpStatus.CONFLICT, 'bank_full', `A bank holds at most ${BANK_MAX_ITEMS} items; start another bank.`);
      }
      const saved = await repo.save(repo.create({ ...content, bankId, position: count }));
      await this.banks.touch(bankId, manager);
      return saved.id;
    });
    return toItemDto(await this.load(bankId, id));
  }

  async update(user: UserEntity, bankId: string, itemId: string, input: ItemInputDto): Promise<ItemDto> {
    await this.banks.access(user, bankId, 'edit');
    const item = await this.load(bankId, itemId);
    Object.assign(item, await this.checked(user, input));
    await this.db.getRepository(ItemEntity).save(item);
    await this.banks.touch(bankId);
    return toItemDto(await this.load(bankId, itemId));
  }

  async remove(user: UserEntity, bankId: string, itemId: string): Promise<void> {
    await this.banks.access(user, bankId, 'edit');
    await this.db.transaction(async (manager) => {
      await manager.query('SELECT id FROM banks WHERE id = $1 FOR UPDATE', [bankId]);
      const item = await manager.getRepository(ItemEntity).findOne({ where: { id: itemId, bankId } });
      if (!item) throw itemNotFound();
      await manager.getRepository(ItemEntity).delete({ id: itemId });
      await manager.query('UPDATE items SET position = position - 1 WHERE bank_id = $1 AND position > $2', [bankId, item.position]);
      await this.banks.touch(bankId, manager);
    });
  }

  /** The bank's new order: every item id exactly once. */
  async reorder(user: UserEntity, bankId: string, itemIds: string[]): Promise<ItemDto[]> {
    await this.banks.access(user, bankId, 'edit');
    await this.db.transaction(async (manager) => {
      await manager.query('SELECT id FROM banks WHERE id = $1 FOR UPDATE', [bankId]);
      const current: { id: string }[] = await manager.query('SELECT id FROM items WHERE bank_id = $1', [bankId]);
      const known = new Set(current.map((r) => r.id));
      const isPermutation = itemIds.length === known.size && new Set(itemIds).size === itemIds.length && itemIds.every((id) => known.has(id));
      if (!isPermutation) {
        refuse([{ field: 'itemIds', message: `List every item of the bank exactly once (${known.size} items).` }]);
      }
      await manager.query(
        `UPDATE items SET position = o.position - 1, updated_at = now()
           FROM unnest($2::uuid[]) WITH ORDINALITY AS o(id, position)
          WHERE items.id = o.id AND items.bank_id = $1`,
        [bankId, itemIds],
      );
      await this.banks.touch(bankId, manager);
    });
    return this.list(user, bankId);
  }

  /** Content built from the input and checked field by field, or a 400 naming the fields. */
  private async checked(user: UserEntity, input: ItemInputDto): Promise<ItemContent> {
    const content = buildItemContent(input, randomUUID);
    const errors = validateItemContent(content);
    if (content.imageId && !(await this.media.isUsableBy(user, content.imageId))) {
      errors.push({ field: 'imageId', message: 'That image is not one of your school\'s uploads; upload it again.' });
    }
    if (errors.length) refuse(errors);
    return content;
  }

  private async load(bankId: string, itemId: string): Promise<ItemEntity> {
    const item = await this.db.getRepository(ItemEntity).findOne({ where: { id: itemId, bankId } });
    if (!item) throw itemNotFound();
    return item;
  }
}
