import { HttpStatus, Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { classLabel } from '@covalent/shared-types';
import type { ClassStudentTrendDto, ClassTrendDto, DebriefDto, StudentHistoryDto, StudentSessionDto } from '@covalent/shared-types';
import { DataSource } from 'typeorm';
import { CatchupService } from '../catchup/catchup.service';
import { ClassesService } from '../classes/classes.service';
import { RosterEntryEntity } from '../classes/entities/roster-entry.entity';
import { ApiException } from '../common/api-error';
import { buildDebrief } from '../debrief/debrief-builder';
import { DebriefService } from '../debrief/debrief.service';
import { accuracyByTag } from '../debrief/domain';
import { SessionEntity } from '../sessions/entities/session.entity';
import { UserEntity } from '../users/entities/user.entity';
import { meanOfFigures } from './domain';

interface PlayedSession {
  row: SessionEntity;
  endedAt: string;
  debrief: DebriefDto;
}

/** A class over time: its sessions' debriefs and catch-ups, by tag and by student. */
@Injectable()
export class HistoryService {
  constructor(
    @InjectDataSource() private readonly db: DataSource,
    private readonly classes: ClassesService,
    private readonly debriefs: DebriefService,
    private readonly catchups: CatchupService,
  ) {}

  /** `GET /api/classes/:id/trends`: accuracy by tag across ended sessions, catch-ups, and every student's line. */
  async trends(user: UserEntity, classId: string): Promise<ClassTrendDto> {
    const { cls } = await this.classes.access(user, classId, 'read');
    const played = await this.playedSessions(classId);
    const [catchups, cards, roster] = await Promise.all([
      this.catchups.forClass(classId),
      this.catchups.cardCountsByStudent(classId),
      this.db.getRepository(RosterEntryEntity).find({ where: { classId }, order: { displayName: 'ASC', id: 'ASC' } }),
    ]);
    const students: ClassStudentTrendDto[] = roster.map((entry) => {
      const results = played.flatMap((p) => p.debrief.students.filter((s) => s.rosterEntryId === entry.id && !s.removed));
      const count = cards.get(entry.id);
      return {
        rosterEntryId: entry.id,
        displayName: entry.displayName,
        sessionsPlayed: results.length,
        meanPercent: meanOfFigures(results.map((s) => s.percent)),
        openCards: count?.open ?? 0,
        clearedCards: count?.cleared ?? 0,
      };
    });
    return {
      classId: cls.id,
      className: classLabel(cls),
      sessions: played.map((p) => ({ sessionId: p.row.id, bankTitle: p.row.bankTitle, endedAt: p.endedAt })),
      tags: accuracyByTag(
        played.map((p) => ({ sessionId: p.row.id, endedAt: p.endedAt, items: p.debrief.items.map((i) => ({ tags: i.tags, p: i.p.value })) })),
      ),
      catchups,
      students,
    };
  }

  /** `GET /api/classes/:classId/roster/:entryId/history`: one student's sessions and catch-ups in this class, oldest first. */
  async student(user: UserEntity, classId: string, entryId: string): Promise<StudentHistoryDto> {
    const { cls, access } = await this.classes.access(user, classId, 'read');
    const entry = await this.db.getRepository(RosterEntryEntity).findOne({ where: { id: entryId, classId } });
    if (!entry) throw new ApiException(HttpStatus.NOT_FOUND, 'not_found', 'No such student in this class.');
    // Only sessions this student played in; deleted data has lost its roster link and does not show.
    const played = await this.playedSessions(classId, entryId);
    const sessions: StudentSessionDto[] = played.flatMap(({ row, debrief }) =>
      debrief.students
        .filter((s) => s.rosterEntryId === entryId && !s.removed)
        .map((s) => ({
          sessionId: row.id,
          bankTitle: row.bankTitle,
          playedAt: debrief.playedAt,
          endedAt: debrief.endedAt,
          format: debrief.format,
          score: s.score,
          percent: s.percent,
          itemCount: debrief.itemCount,
          answered: s.answered,
          missed: s.missed.map((m) => ({ itemId: m.itemId, prompt: m.prompt, credit: m.credit, answerText: m.answerText, keyText: m.keyText })),
        })),
    );
    return {
      classId: cls.id,
      className: classLabel(cls),
      rosterEntryId: entry.id,
      displayName: entry.displayName,
      tableGroup: entry.tableGroup,
      sessions,
      catchups: await this.catchups.forStudent(classId, entryId),
      meanPercent: meanOfFigures(sessions.map((s) => s.percent)),
      canDeleteData: access === 'owner',
    };
  }

  /** The class's ended sessions (optionally only those a roster entry played in), oldest first, with their debriefs. */
  private async playedSessions(classId: string, rosterEntryId?: string): Promise<PlayedSession[]> {
    const query = this.db
      .getRepository(SessionEntity)
      .createQueryBuilder('s')
      .leftJoinAndSelect('s.class', 'class')
      .where('s.class_id = :classId AND s.status = :ended', { classId, ended: 'ended' })
      .orderBy('s.ended_at', 'ASC', 'NULLS LAST')
      .addOrderBy('s.id', 'ASC');
    if (rosterEntryId) {
      query.andWhere('EXISTS (SELECT 1 FROM session_players sp WHERE sp.session_id = s.id AND sp.roster_entry_id = :rosterEntryId)', { rosterEntryId });
    }
    const rows = await query.getMany();
    const out: PlayedSession[] = [];
    for (const row of rows) {
      out.push({ row, endedAt: (row.endedAt ?? row.updatedAt).toISOString(), debrief: buildDebrief(await this.debriefs.load(row)).dto });
    }
    return out;
  }
}
