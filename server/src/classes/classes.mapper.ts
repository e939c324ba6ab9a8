import type { ClassAccess, ClassDetailDto, ClassDto, CoTeacherDto, PairRuleDto, RosterEntryDto } from '@covalent/shared-types';
import { ClassCoTeacherEntity } from './entities/class-co-teacher.entity';
import { ClassEntity } from './entities/class.entity';
import { PairRuleEntity } from './entities/pair-rule.entity';
import { RosterEntryEntity } from './entities/roster-entry.entity';

export const toCoTeacherDto = (c: ClassCoTeacherEntity): CoTeacherDto => ({
  userId: c.userId,
  displayName: c.user?.displayName ?? '',
  email: c.user?.email ?? '',
});

export function toClassDto(cls: ClassEntity, access: ClassAccess, rosterCount: number, coTeachers: ClassCoTeacherEntity[]): ClassDto {
  return {
    id: cls.id,
    ownerId: cls.ownerId,
    ownerName: cls.owner?.displayName ?? '',
    name: cls.name,
    period: cls.period,
    term: cls.term,
    archivedAt: cls.archivedAt?.toISOString() ?? null,
    rosterCount,
    coTeachers: coTeachers.map(toCoTeacherDto),
    access,
    createdAt: cls.createdAt.toISOString(),
    updatedAt: cls.updatedAt.toISOString(),
  };
}

export const toRosterEntryDto = (e: RosterEntryEntity): RosterEntryDto => ({
  id: e.id,
  classId: e.classId,
  displayName: e.displayName,
  tableGroup: e.tableGroup,
  seatNumber: e.seatNumber,
  timeMultiplier: e.timeMultiplier,
});

export const toPairRuleDto = (p: PairRuleEntity): PairRuleDto => ({
  id: p.id,
  classId: p.classId,
  kind: p.kind,
  entryAId: p.entryAId,
  entryBId: p.entryBId,
});

export function toClassDetailDto(
  cls: ClassEntity,
  access: ClassAccess,
  coTeachers: ClassCoTeacherEntity[],
  roster: RosterEntryEntity[],
  pairs: PairRuleEntity[],
): ClassDetailDto {
  return { ...toClassDto(cls, access, roster.length, coTeachers), roster: roster.map(toRosterEntryDto), pairs: pairs.map(toPairRuleDto) };
}
