import { HttpStatus, Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { BankAccess, BankDetailDto, BankDto } from '@covalent/shared-types';
import { DataSource, EntityManager } from 'typeorm';
import { ApiException } from '../common/api-error';
import { UserEntity } from '../users/entities/user.entity';
import { allows, type BankNeed } from './bank-access';
import { toBankDetailDto, toBankDto } from './banks.mapper';
import { findColleague } from './colleague';
import { CreateBankDto, DuplicateBankDto, ListBanksQueryDto, ShareBankDto, UpdateBankDto } from './dto/bank.dto';
import { BankShareEntity } from './entities/bank-share.entity';
import { BankEntity } from './entities/bank.entity';
import { ItemEntity } from './entities/item.entity';

export interface AccessibleBank {
  bank: BankEntity;
  access: BankAccess;
}

const notFound = () => new ApiException(HttpStatus.NOT_FOUND, 'not_found', 'No such bank.');
const forbidden = (need: BankNeed) =>
  new ApiException(
    HttpStatus.FORBIDDEN,
    'forbidden',
    need === 'own' ? 'Only the bank\'s owner can do that.' : 'This bank is shared with you to view only.',
  );

const SORT_COLUMNS = { title: 'sort_title', updatedAt: 'bank.updatedAt', itemCount: 'item_count' } as const;
const escapeLike = (s: string) => s.replace(/[\\%_]/g, (c) => `\\${c}`);

@Injectable()
export class BanksService {
  constructor(@InjectDataSource() private readonly db: DataSource) {}

  /** The bank and the user's access to it; 404 when the user may not know it exists, 403 when they may not do this. */
  async access(user: UserEntity, bankId: string, need: BankNeed, manager: EntityManager = this.db.manager): Promise<AccessibleBank> {
    const bank = await manager.getRepository(BankEntity).findOne({ where: { id: bankId, schoolId: user.schoolId }, relations: { owner: true } });
    if (!bank) throw notFound();
    let access: BankAccess | null = null;
    if (bank.ownerId === user.id) access = 'owner';
    else {
      const share = await manager.getRepository(BankShareEntity).findOne({ where: { bankId, userId: user.id } });
      if (share) access = share.access;
      else if (user.role === 'admin') access = 'admin';
    }
    if (!access) throw notFound();
    if (!allows(access, need)) throw forbidden(need);
    return { bank, access };
  }

  /** Banks the user owns or has a share of (an admin with scope=school: the whole school's). */
  async list(user: UserEntity, query: ListBanksQueryDto): Promise<BankDto[]> {
    const qb = this.db
      .getRepository(BankEntity)
      .createQueryBuilder('bank')
      .leftJoinAndSelect('bank.owner', 'owner')
      .leftJoin(BankShareEntity, 'share', 'share.bank_id = bank.id AND share.user_id = :uid', { uid: user.id })
      .addSelect('share.access', 'share_access')
      .addSelect('(SELECT COUNT(*) FROM items i WHERE i.bank_id = bank.id)::int', 'item_count')
      .addSelect('LOWER(bank.title)', 'sort_title')
      .where('bank.school_id = :school', { school: user.schoolId });
    const wholeSchool = user.role === 'admin' && query.scope === 'school';
    if (!wholeSchool) qb.andWhere('(bank.owner_id = :uid OR share.id IS NOT NULL)');
    if (query.q) qb.andWhere("bank.title ILIKE :q ESCAPE '\\'", { q: `%${escapeLike(query.q)}%` });
    if (query.tag) qb.andWhere(':tag = ANY(bank.tags)', { tag: query.tag });
    const archived = query.archived ?? 'false';
    if (archived === 'false') qb.andWhere('bank.archived_at IS NULL');
    if (archived === 'true') qb.andWhere('bank.archived_at IS NOT NULL');
    const sort = query.sort ?? 'updatedAt';
    const dir = (query.dir ?? (sort === 'title' ? 'asc' : 'desc')).toUpperCase() as 'ASC' | 'DESC';
    qb.orderBy(SORT_COLUMNS[sort], dir).addOrderBy('bank.id', 'ASC');
    const { entities, raw } = await qb.getRawAndEntities<{ bank_id: string; share_access: BankAccess | null; item_count: number }>();
    const byId = new Map(raw.map((r) => [r.bank_id, r]));
    return entities.map((bank) => {
      const r = byId.get(bank.id);
      const access: BankAccess = bank.ownerId === user.id ? 'owner' : (r?.share_access ?? 'admin');
      return toBankDto(bank, r?.item_count ?? 0, access);
    });
  }

  async create(user: UserEntity, dto: CreateBankDto, manager: EntityManager = this.db.manager): Promise<BankEntity> {
    const repo = manager.getRepository(BankEntity);
    const bank = await repo.save(
      repo.create({
        ownerId: user.id,
        schoolId: user.schoolId,
        title: dto.title,
        description: dto.description ?? '',
        tags: dto.tags ?? [],
        standardsCode: dto.standardsCode || null,
        archivedAt: null,
      }),
    );
    bank.owner = user;
    return bank;
  }

  async detail(user: UserEntity, bankId: string): Promise<BankDetailDto> {
    const { bank, access } = await this.access(user, bankId, 'read');
    const [items, shares] = await Promise.all([
      this.db.getRepository(ItemEntity).find({ where: { bankId }, order: { position: 'ASC' } }),
      this.db.getRepository(BankShareEntity).find({ where: { bankId }, relations: { user: true }, order: { createdAt: 'ASC' } }),
    ]);
    return toBankDetailDto(bank, access, items, shares);
  }

  async summary(user: UserEntity, bankId: string): Promise<BankDto> {
    const { bank, access } = await this.access(user, bankId, 'read');
    return toBankDto(bank, await this.db.getRepository(ItemEntity).count({ where: { bankId } }), access);
  }

  async update(user: UserEntity, bankId: string, dto: UpdateBankDto): Promise<BankDto> {
    const { bank } = await this.access(user, bankId, 'edit');
    if (dto.title !== undefined) bank.title = dto.title;
    if (dto.description !== undefined) bank.description = dto.description;
    if (dto.tags !== undefined) bank.tags = dto.tags;
    if (dto.standardsCode !== undefined) bank.standardsCode = dto.standardsCode || null;
    await this.db.getRepository(BankEntity).save(bank);
    return this.summary(user, bankId);
  }

  async setArchived(user: UserEntity, bankId: string, archived: boolean): Promise<BankDto> {
    const { bank } = await this.access(user, bankId, 'own');
    bank.archivedAt = archived ? (bank.archivedAt ?? new Date()) : null;
    await this.db.getRepository(BankEntity).save(bank);
    return this.summary(user, bankId);
  }

  async remove(user: UserEntity, bankId: string): Promise<void> {
    await this.access(user, bankId, 'own');
    await this.db.getRepository(BankEntity).delete({ id: bankId });
  }

  /** A copy owned by the caller, with every item; anyone who can read a bank may copy it. */
  async duplicate(user: UserEntity, bankId: string, dto: DuplicateBankDto): Promise<BankDto> {
    const copyId = await this.db.transaction(async (manager) => {
      const { bank } = await this.access(user, bankId, 'read', manager);
      const copy = await this.create(
        user,
        { title: dto.title ?? `${bank.title} (copy)`.slice(0, 120), description: bank.description, tags: bank.tags, standardsCode: bank.standardsCode },
        manager,
      );
      const items = await manager.getRepository(ItemEntity).find({ where: { bankId }, order: { position: 'ASC' } });
      await manager.getRepository(ItemEntity).insert(
        items.map((item, position) => ({
          bankId: copy.id,
          position,
          type: item.type,
          prompt: item.prompt,
          options: item.options,
          key: item.key,
          explanation: item.explanation,
          tags: item.tags,
          imageId: item.imageId,
        })),
      );
      return copy.id;
    });
    return this.summary(user, copyId);
  }

  async share(user: UserEntity, bankId: string, dto: ShareBankDto): Promise<BankDetailDto> {
    const { bank } = await this.access(user, bankId, 'own');
    const colleague = await findColleague(this.db.manager, user, dto);
    if (colleague.id === bank.ownerId) throw new ApiException(HttpStatus.CONFLICT, 'cannot_add_self', 'You already own this bank.');
    await this.db
      .getRepository(BankShareEntity)
      .upsert({ bankId, userId: colleague.id, access: dto.access }, { conflictPaths: ['bankId', 'userId'] });
    return this.detail(user, bankId);
  }

  async unshare(user: UserEntity, bankId: string, userId: string): Promise<void> {
    await this.access(user, bankId, 'own');
    const { affected } = await this.db.getRepository(BankShareEntity).delete({ bankId, userId });
    if (!affected) throw new ApiException(HttpStatus.NOT_FOUND, 'not_found', 'This bank is not shared with that teacher.');
  }

  /** Items changed: the bank counts as updated for sorting. */
  async touch(bankId: string, manager: EntityManager = this.db.manager): Promise<void> {
    await manager.query('UPDATE banks SET updated_at = now() WHERE id = $1', [bankId]);
  }
}
