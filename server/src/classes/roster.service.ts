import { HttpStatus, Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { ImportResultDto, PairRuleDto, RosterEntryDto } from '@covalent/shared-types';
import { DataSource, In } from 'typeorm';
import { closeEmptyCatchups } from '../catchup/close-empty-catchups';
import { ApiException } from '../common/api-error';
import { readCsvTable, refuseIfProblems } from '../media/csv-table';
import { UserEntity } from '../users/entities/user.entity';
import { toPairRuleDto, toRosterEntryDto } from './classes.mapper';
import { ClassesService } from './classes.service';
import { nameKey, ROSTER_CSV_COLUMNS, rowsToEntries } from './csv/roster-csv';
import { CreatePairRuleDto, CreateRosterEntryDto, UpdateRosterEntryDto } from './dto/class.dto';
import { PairRuleEntity } from './entities/pair-rule.entity';
import { RosterEntryEntity } from './entities/roster-entry.entity';

/** Largest class we take; DESIGN §1 expects 25–35. */
export const ROSTER_MAX = 200;

const entryNotFound = () => new ApiException(HttpStatus.NOT_FOUND, 'not_found', 'No such student in this class.');
const nameTaken = (name: string) =>
  new ApiException(HttpStatus.CONFLICT, 'name_taken', `"${name}" is already on this roster; add a letter to tell them apart.`, [
    { field: 'displayName', message: 'Another student in this class has this name.' },
  ]);

/** Roster and pair rules: co-teachers and admins read; only the class owner writes. */
@Injectable()
export class RosterService {
  constructor(
    @InjectDataSource() private readonly db: DataSource,
    private readonly classes: ClassesService,
  ) {}

  async list(user: UserEntity, classId: string): Promise<RosterEntryDto[]> {
    await this.classes.access(user, classId, 'read');
    const entries = await this.db
      .getRepository(RosterEntryEntity)
      .find({ where: { classId }, order: { tableGroup: 'ASC', seatNumber: 'ASC', displayName: 'ASC' } });
    return entries.map(toRosterEntryDto);
  }

  async create(user: UserEntity, classId: string, dto: CreateRosterEntryDto): Promise<RosterEntryDto> {
    await this.classes.access(user, classId, 'own');
    await this.assertNameFree(classId, dto.displayName, null);
    const repo = this.db.getRepository(RosterEntryEntity);
    const count = await repo.count({ where: { classId } });
    if (count >= ROSTER_MAX) throw new ApiException(HttpStatus.CONFLICT, 'roster_full', `A class holds at most ${ROSTER_MAX} students.`);
    const entry = await repo.save(
      repo.create({
        classId,
        displayName: dto.displayName,
        tableGroup: dto.tableGroup || null,
        seatNumber: dto.seatNumber ?? null,
        timeMultiplier: dto.timeMultiplier ?? 1,
      }),
    );
    return toRosterEntryDto(entry);
  }

  async update(user: UserEntity, classId: string, entryId: string, dto: UpdateRosterEntryDto): Promise<RosterEntryDto> {
    await this.classes.access(user, classId, 'own');
    const repo = this.db.getRepository(RosterEntryEntity);
    const entry = await repo.findOne({ where: { id: entryId, classId } });
    if (!entry) throw entryNotFound();
    if (dto.displayName !== undefined) {
      await this.assertNameFree(classId, dto.displayName, entryId);
      entry.displayName = dto.displayName;
    }
    if (dto.tableGroup !== undefined) entry.tableGroup = dto.tableGroup || null;
    if (dto.seatNumber !== undefined) entry.seatNumber = dto.seatNumber;
    if (dto.timeMultiplier !== undefined) entry.timeMultiplier = dto.timeMultiplier;
    return toRosterEntryDto(await repo.save(entry));
  }

  async remove(user: UserEntity, classId: string, entryId: string): Promise<void> {
    await this.classes.access(user, classId, 'own');
    await this.db.transaction(async (m) => {
      // Their catch-up cards go with them (ON DELETE CASCADE).
      const { affected } = await m.getRepository(RosterEntryEntity).delete({ id: entryId, classId });
      if (!affected) throw entryNotFound();
      await closeEmptyCatchups(m, { classId });
    });
  }

  /** Appends (or, with `replace`, swaps in) a roster from CSV; every row checked first, one transaction. */
  async importCsv(user: UserEntity, classId: string, bytes: Buffer, mode: 'append' | 'replace'): Promise<ImportResultDto> {
    await this.classes.access(user, classId, 'own');
    const { rows, problems } = readCsvTable(bytes, ROSTER_CSV_COLUMNS, ROSTER_MAX);
    return this.db.transaction(async (manager) => {
      await manager.query('SELECT id FROM classes WHERE id = $1 FOR UPDATE', [classId]);
      const repo = manager.getRepository(RosterEntryEntity);
      const existing = mode === 'append' ? await repo.find({ where: { classId } }) : [];
      const { entries, problems: rowProblems } = rowsToEntries(rows, new Set(existing.map((e) => nameKey(e.displayName))));
      if (existing.length + entries.length > ROSTER_MAX) {
        rowProblems.push({ field: 'file', message: `A class holds at most ${ROSTER_MAX} students; this would make ${existing.length + entries.length}.` });
      }
      refuseIfProblems([...problems, ...rowProblems]);
      if (mode === 'replace') {
        await repo.delete({ classId });
        await closeEmptyCatchups(manager, { classId });
      }
      await repo.insert(entries.map((e) => ({ ...e, classId })));
      return { targetId: classId, imported: entries.length };
    });
  }

  async listPairs(user: UserEntity, classId: string): Promise<PairRuleDto[]> {
    await this.classes.access(user, classId, 'read');
    const pairs = await this.db.getRepository(PairRuleEntity).find({ where: { classId }, order: { createdAt: 'ASC' } });
    return pairs.map(toPairRuleDto);
  }

  /** A keep-apart or keep-together rule; a pair holds one rule at a time (the new one replaces the old). */
  async addPair(user: UserEntity, classId: string, dto: CreatePairRuleDto): Promise<PairRuleDto> {
    await this.classes.access(user, classId, 'own');
    if (dto.entryAId === dto.entryBId) {
      throw new ApiException(HttpStatus.BAD_REQUEST, 'validation_failed', 'Choose two different students.', [
        { field: 'entryBId', message: 'Choose a different student from the first.' },
      ]);
    }
    const found = await this.db.getRepository(RosterEntryEntity).count({ where: { classId, id: In([dto.entryAId, dto.entryBId]) } });
    if (found !== 2) throw entryNotFound();
    const [entryAId, entryBId] = [dto.entryAId, dto.entryBId].sort();
    const repo = this.db.getRepository(PairRuleEntity);
    await repo.upsert({ classId, kind: dto.kind, entryAId, entryBId }, { conflictPaths: ['classId', 'entryAId', 'entryBId'] });
    return toPairRuleDto(await repo.findOneByOrFail({ classId, entryAId, entryBId }));
  }

  async removePair(user: UserEntity, classId: string, pairId: string): Promise<void> {
    await this.classes.access(user, classId, 'own');
    const { affected } = await this.db.getRepository(PairRuleEntity).delete({ id: pairId, classId });
    if (!affected) throw new ApiException(HttpStatus.NOT_FOUND, 'not_found', 'No such pair rule in this class.');
  }

  private async assertNameFree(classId: string, name: string, exceptId: string | null): Promise<void> {
    const entries = await this.db.getRepository(RosterEntryEntity).find({ where: { classId }, select: { id: true, displayName: true } });
    if (entries.some((e) => e.id !== exceptId && nameKey(e.displayName) === nameKey(name))) throw nameTaken(name);
  }
}
