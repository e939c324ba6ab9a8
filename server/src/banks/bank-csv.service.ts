import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { ImportResultDto, ItemContent } from '@covalent/shared-types';
import { randomUUID } from 'node:crypto';
import { DataSource, EntityManager } from 'typeorm';
import { readCsvTable, refuseIfProblems, writeCsvTable } from '../media/csv-table';
import { UserEntity } from '../users/entities/user.entity';
import { toItemContent } from './banks.mapper';
import { BanksService } from './banks.service';
import { BANK_CSV_COLUMNS, itemToRow, rowToItem } from './csv/bank-csv';
import { ItemEntity } from './entities/item.entity';
import { BANK_MAX_ITEMS } from './items.service';

/** Every row checked before anything is written; one transaction writes them all. */
function parseBankCsv(bytes: Uint8Array): ItemContent[] {
  const { rows, problems } = readCsvTable(bytes, BANK_CSV_COLUMNS);
  const items: ItemContent[] = [];
  for (const row of rows) {
    const result = rowToItem(row, randomUUID);
    problems.push(...result.problems);
    if (result.item) items.push(result.item);
  }
  refuseIfProblems(problems);
  return items;
}

const slug = (title: string): string =>
  title
    .normalize('NFKD')
    .replace(/[^\w\s-]/g, '')
    .trim()
    .replace(/\s+/g, '-')
    .toLowerCase()
    .slice(0, 60) || 'bank';

@Injectable()
export class BankCsvService {
  constructor(
    @InjectDataSource() private readonly db: DataSource,
    private readonly banks: BanksService,
  ) {}

  /** A new bank from a CSV file; titled after the file unless a title is given. */
  async importNewBank(user: UserEntity, bytes: Buffer, fileName: string, title?: string): Promise<ImportResultDto> {
    const items = parseBankCsv(bytes);
    const bankTitle = title ?? (fileName.replace(/\.csv$/i, '').trim().slice(0, 120) || 'Imported bank');
    return this.db.transaction(async (manager) => {
      const bank = await this.banks.create(user, { title: bankTitle }, manager);
      await this.append(manager, bank.id, 0, items);
      return { targetId: bank.id, imported: items.length };
    });
  }

  /** Appends a CSV file's items to a bank the user may edit. */
  async importIntoBank(user: UserEntity, bankId: string, bytes: Buffer): Promise<ImportResultDto> {
    await this.banks.access(user, bankId, 'edit');
    const items = parseBankCsv(bytes);
    return this.db.transaction(async (manager) => {
      await manager.query('SELECT id FROM banks WHERE id = $1 FOR UPDATE', [bankId]);
      const count = await manager.getRepository(ItemEntity).count({ where: { bankId } });
      if (count + items.length > BANK_MAX_ITEMS) refuseIfProblems([{ field: 'file', message: `A bank holds at most ${BANK_MAX_ITEMS} items.` }]);
      await this.append(manager, bankId, count, items);
      await this.banks.touch(bankId, manager);
      return { targetId: bankId, imported: items.length };
    });
  }

  async exportBank(user: UserEntity, bankId: string): Promise<{ csv: string; fileName: string }> {
    const { bank } = await this.banks.access(user, bankId, 'read');
    const items = await this.db.getRepository(ItemEntity).find({ where: { bankId }, order: { position: 'ASC' } });
    return { csv: writeCsvTable(BANK_CSV_COLUMNS, items.map((i) => itemToRow(toItemContent(i)))), fileName: `${slug(bank.title)}.csv` };
  }

  private async append(manager: EntityManager, bankId: string, start: number, items: ItemContent[]): Promise<void> {
    if (items.length === 0) return;
    await manager.getRepository(ItemEntity).insert(items.map((item, i) => ({ ...item, bankId, position: start + i })));
  }
}
