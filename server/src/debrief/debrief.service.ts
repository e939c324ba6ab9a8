import { HttpStatus, Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { classLabel } from '@covalent/shared-types';
import type {
  DebriefDto,
  DebriefEmailResponse,
  DebriefItemDto,
  DebriefSummaryDto,
  ItemResponse,
} from '@covalent/shared-types';
import { DataSource, In } from 'typeorm';
import { ClassCoTeacherEntity } from '../classes/entities/class-co-teacher.entity';
import { ApiException } from '../common/api-error';
import { MailService } from '../mail/mail.service';
import { SessionEntity } from '../sessions/entities/session.entity';
import { SessionsService } from '../sessions/sessions.service';
import { UserEntity } from '../users/entities/user.entity';
import { buildDebrief } from './debrief-builder';
import type { DebriefSource, SourceTeamRound } from './debrief-source';
import { debriefEmail } from './exports/debrief-email';
import { exportFileName, gradebookCsv, itemAnalysisCsv } from './exports/debrief-csv';
import { isDeletedNicknameKey } from './player-data';

const notFound = () => new ApiException(HttpStatus.NOT_FOUND, 'not_found', 'No such session.');
/** Most sessions listed by GET /api/debriefs. */
const LIST_LIMIT = 100;

export interface CsvExport {
  csv: string;
  fileName: string;
}

/** Loads a session's stored results, checks who may read them, and builds the debrief. */
@Injectable()
export class DebriefService {
  constructor(
    @InjectDataSource() private readonly db: DataSource,
    private readonly sessions: SessionsService,
    private readonly mail: MailService,
  ) {}

  /** The session if the user may read its reports (owner, class teacher or co-teacher, school admin); 404 otherwise. */
  async readable(user: UserEntity, sessionId: string): Promise<SessionEntity> {
    const row = await this.db.getRepository(SessionEntity).findOne({ where: { id: sessionId }, relations: { class: true } });
    if (!row || !(await this.sessions.canHost(user, row))) throw notFound();
    return row;
  }

  private async endedSession(user: UserEntity, sessionId: string): Promise<SessionEntity> {
    const row = await this.readable(user, sessionId);
    if (row.status !== 'ended') {
      throw new ApiException(HttpStatus.CONFLICT, 'session_not_ended', 'The debrief is ready once the session has ended.');
    }
    return row;
  }

  async debrief(user: UserEntity, sessionId: string): Promise<DebriefDto> {
    return buildDebrief(await this.load(await this.endedSession(user, sessionId))).dto;
  }

  async item(user: UserEntity, sessionId: string, itemId: string): Promise<DebriefItemDto> {
    const item = (await this.debrief(user, sessionId)).items.find((i) => i.id === itemId);
    if (!item) throw new ApiException(HttpStatus.NOT_FOUND, 'not_found', 'No such item in this session.');
    return item;
  }

  async gradebook(user: UserEntity, sessionId: string): Promise<CsvExport> {
    const d = await this.debrief(user, sessionId);
    return { csv: gradebookCsv(d), fileName: exportFileName(d, 'gradebook') };
  }

  async itemAnalysis(user: UserEntity, sessionId: string): Promise<CsvExport> {
    const d = await this.debrief(user, sessionId);
    return { csv: itemAnalysisCsv(d), fileName: exportFileName(d, 'item-analysis') };
  }

  /** Mails the debrief with the gradebook CSV to the session's teacher and the class's teachers. */
  async email(user: UserEntity, sessionId: string): Promise<DebriefEmailResponse> {
    const row = await this.endedSession(user, sessionId);
    const d = buildDebrief(await this.load(row)).dto;
    const recipients = await this.recipients(row);
    const body = debriefEmail(d);
    await this.mail.send({
      to: recipients,
      subject: body.subject,
      text: body.text,
      html: body.html,
      attachments: [{ filename: exportFileName(d, 'gradebook'), content: gradebookCsv(d), contentType: 'text/csv; charset=utf-8' }],
    });
    return { ok: true, recipients };
  }

  private async recipients(row: SessionEntity): Promise<string[]> {
    const userIds = new Set([row.ownerId]);
    if (row.classId) {
      if (row.class) userIds.add(row.class.ownerId);
      const co = await this.db.getRepository(ClassCoTeacherEntity).find({ where: { classId: row.classId } });
      for (const c of co) userIds.add(c.userId);
    }
    const users = await this.db.getRepository(UserEntity).find({ where: { id: In([...userIds]), active: true }, order: { email: 'ASC' } });
    return users.map((u) => u.email);
  }

  /** Ended sessions the user may read, newest first, with headline figures. */
  async list(user: UserEntity): Promise<DebriefSummaryDto[]> {
    const ids: { id: string }[] = await this.db.query(
      `SELECT s.id FROM sessions s
       WHERE s.school_id = $2 AND s.status = 'ended' AND ($3 OR s.owner_id = $1
          OR s.class_id IN (SELECT id FROM classes WHERE owner_id = $1 UNION SELECT class_id FROM class_co_teachers WHERE user_id = $1))
       ORDER BY s.ended_at DESC NULLS LAST, s.id LIMIT $4`,
      [user.id, user.schoolId, user.role === 'admin', LIST_LIMIT],
    );
    const rows = await this.db.getRepository(SessionEntity).find({ where: { id: In(ids.map((r) => r.id)) }, relations: { class: true } });
    const byId = new Map(rows.map((r) => [r.id, r]));
    const out: DebriefSummaryDto[] = [];
    for (const { id } of ids) {
      const row = byId.get(id);
      if (!row) continue;
      const { items: _items, students: _students, teams: _teams, ...summary } = buildDebrief(await this.load(row)).dto;
      out.push(summary);
    }
    return out;
  }

  /** Everything the debrief needs from the database. */
  async load(row: SessionEntity): Promise<DebriefSource> {
    const [rounds, players, teams, responses] = await Promise.all([
      this.db.query(
        `SELECT "index", item_id FROM session_rounds WHERE session_id = $1 AND status IN ('closed', 'revealed') ORDER BY "index"`,
        [row.id],
      ) as Promise<{ index: number; item_id: string }[]>,
      this.db.query(
        `SELECT sp.id, sp.nickname, sp.nickname_key, sp.roster_entry_id, re.display_name AS roster_name, sp.team_id, sp.status
         FROM session_players sp LEFT JOIN roster_entries re ON re.id = sp.roster_entry_id
         WHERE sp.session_id = $1 ORDER BY sp.created_at, sp.id`,
        [row.id],
      ) as Promise<{ id: string; nickname: string; nickname_key: string; roster_entry_id: string | null; roster_name: string | null; team_id: string | null; status: string }[]>,
      this.db.query('SELECT id, name FROM session_teams WHERE session_id = $1 ORDER BY position', [row.id]) as Promise<{ id: string; name: string }[]>,
      this.db.query(
        `SELECT player_id, team_id, round_index, response, credit FROM responses
         WHERE session_id = $1 AND final AND kind = 'answer' AND credit IS NOT NULL ORDER BY seq`,
        [row.id],
      ) as Promise<{ player_id: string; team_id: string | null; round_index: number; response: ItemResponse | null; credit: number }[]>,
    ]);
    const itemsById = new Map(row.items.map((i) => [i.id, i]));
    const itemByRound = new Map(rounds.map((r) => [r.index, r.item_id]));
    const played = rounds.map((r) => itemsById.get(r.item_id)).filter((i) => i !== undefined);
    const teamRounds: SourceTeamRound[] = (row.snapshot.rounds ?? []).flatMap((r) =>
      (r.results?.teams ?? []).map((t) => ({
        teamId: t.teamId,
        itemId: t.itemId,
        points: t.points,
        correct: t.correct,
        correctShare: t.correctShare,
        unity: t.unity,
      })),
    );
    return {
      session: {
        id: row.id,
        bankId: row.bankId,
        bankTitle: row.bankTitle,
        classId: row.classId,
        className: row.class ? classLabel(row.class) : null,
        format: row.format,
        startedAt: row.startedAt,
        createdAt: row.createdAt,
        endedAt: row.endedAt,
      },
      items: played,
      players: players.map((p) => {
        const deleted = isDeletedNicknameKey(p.nickname_key);
        return {
          id: p.id,
          nickname: p.nickname,
          rosterEntryId: p.roster_entry_id,
          rosterName: p.roster_name,
          teamId: p.team_id,
          deleted,
          removedByHost: !deleted && p.status === 'removed',
        };
      }),
      teams,
      responses: responses.flatMap((r) => {
        const itemId = itemByRound.get(r.round_index);
        return itemId ? [{ playerId: r.player_id, teamId: r.team_id, itemId, response: r.response, credit: r.credit }] : [];
      }),
      teamRounds,
    };
  }
}
