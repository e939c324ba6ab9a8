import type { BankAccess, BankDetailDto, BankDto, BankShareDto, ItemContent, ItemDto } from '@covalent/shared-types';
import { BankShareEntity } from './entities/bank-share.entity';
import { BankEntity } from './entities/bank.entity';
import { ItemEntity } from './entities/item.entity';

export function toBankDto(bank: BankEntity, itemCount: number, access: BankAccess): BankDto {
  return {
    id: bank.id,
    ownerId: bank.ownerId,
    ownerName: bank.owner?.displayName ?? '',
    title: bank.title,
    description: bank.description,
    tags: bank.tags,
    standardsCode: bank.standardsCode,
    archivedAt: bank.archivedAt?.toISOString() ?? null,
    itemCount,
    access,
    createdAt: bank.createdAt.toISOString(),
    updatedAt: bank.updatedAt.toISOString(),
  };
}

export function toItemContent(item: ItemEntity): ItemContent {
  return {
    type: item.type,
    prompt: item.prompt,
    options: item.options,
    key: item.key,
    explanation: item.explanation,
    tags: item.tags,
    imageId: item.imageId,
  };
}

export function toItemDto(item: ItemEntity): ItemDto {
  return {
    id: item.id,
    bankId: item.bankId,
    position: item.position,
    ...toItemContent(item),
    createdAt: item.createdAt.toISOString(),
    updatedAt: item.updatedAt.toISOString(),
  };
}

export function toBankShareDto(share: BankShareEntity): BankShareDto {
  return { userId: share.userId, displayName: share.user?.displayName ?? '', email: share.user?.email ?? '', access: share.access };
}

export function toBankDetailDto(bank: BankEntity, access: BankAccess, items: ItemEntity[], shares: BankShareEntity[]): BankDetailDto {
  return {
    ...toBankDto(bank, items.length, access),
    items: items.map(toItemDto),
    // Who else has the bank is the owner's business (and the admin's).
    shares: access === 'owner' || access === 'admin' ? shares.map(toBankShareDto) : [],
  };
}
