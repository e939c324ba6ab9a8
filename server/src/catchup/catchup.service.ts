import { HttpStatus, Inject, Injectable } from '@nestjs/common';
import { ConfigType } from '@nestjs/config';
import { InjectDataSource } from '@nestjs/typeorm';
import type {
  CatchupAnswerResponse,
  CatchupBox,
  CatchupCardResultDto,
  CatchupInfoResponse,
  CatchupResultsDto,
  CatchupStartResponse,
  CatchupStudentResultDto,
  CatchupSummaryDto,
  CreateCatchupResponse,
  FigureDto,
  StudentCatchupDto,
} from '@covalent/shared-types';
import { DataSource, EntityManager, In, IsNull } from 'typeorm';
import { RosterEntryEntity } from '../classes/entities/roster-entry.entity';
import { ApiException } from '../common/api-error';
import { appConfig } from '../config/app.config';
import { DebriefService } from '../debrief/debrief.service';
import { computed, notComputed } from '../debrief/domain';
import { checkAnswer } from '../scoring/domain/answer-check';
import { SessionEntity, type SessionItem } from '../sessions/entities/session.entity';
import { newJoinCode, normaliseJoinCode } from '../sessions/join-code';
import { JoinAttemptLimiter } from '../sessions/join-rate-limit.guard';
import { parseResponse } from '../sessions/live/payloads';
import { UserEntity } from '../users/entities/user.entity';
import { CATCHUP_CLOCK, CODE_ATTEMPTS, type CatchupClock } from './catchup.constants';
import { signCatchupToken, verifyCatchupToken } from './catchup-token';
import { catchupItemView } from './catchup-views';
import { dueCards, earliestDue, isCorrect, isDue, newCard, planCards, review, type LeitnerCard } from './domain';
import { CatchupAnswerEntity } from './entities/catchup-answer.entity';
import { CatchupCardEntity } from './entities/catchup-card.entity';
import { CatchupEntity } from './entities/catchup.entity';
import { CatchupAnswerDto } from './dto/catchup-answer.dto';

const notFound = (message = 'No such catch-up.') => new ApiException(HttpStatus.NOT_FOUND, 'not_found', message);

const leitner = (c: CatchupCardEntity): LeitnerCard => ({ box: c.box, dueAt: c.dueAt.getTime(), reviewedAt: c.lastAnsweredAt?.getTime() ?? null });

/** One card with its attempts and last result (alias c = catchup_cards). */
const CARD_COLUMNS = `c.roster_entry_id, c.item_id, c.box, c.due_at, c.last_answered_at,
  (SELECT COUNT(*)::int FROM catchup_answers a WHERE a.card_id = c.id) AS attempts,
  (SELECT COUNT(*)::int FROM catchup_answers a WHERE a.card_id = c.id AND a.correct) AS correct_attempts,
  (SELECT a.correct FROM catchup_answers a WHERE a.card_id = c.id ORDER BY a.answered_at DESC, a.created_at DESC LIMIT 1) AS last_correct`;

interface CardRow {
  roster_entry_id: string;
  item_id: string;
  box: CatchupBox;
  due_at: Date;
  last_answered_at: Date | null;
  attempts: number;
  correct_attempts: number;
  last_correct: boolean | null;
}

/** Counts over a catch-up's cards (alias c) and their answers (alias a, from CARD_ATTEMPTS). */
const CARD_COUNTS = `COUNT(DISTINCT c.roster_entry_id)::int AS student_count,
  COUNT(DISTINCT c.roster_entry_id) FILTER (WHERE c.last_answered_at IS NOT NULL)::int AS started_count,
  COUNT(c.id)::int AS card_count,
  COUNT(c.id) FILTER (WHERE c.box >= 2)::int AS cleared_count,
  COUNT(c.id) FILTER (WHERE c.box = 1)::int AS box1, COUNT(c.id) FILTER (WHERE c.box = 2)::int AS box2,
  COUNT(c.id) FILTER (WHERE c.box = 3)::int AS box3, COUNT(c.id) FILTER (WHERE c.box = 4)::int AS box4,
  COUNT(c.id) FILTER (WHERE c.box = 5)::int AS box5,
  COALESCE(SUM(a.attempts), 0)::int AS attempts, COALESCE(SUM(a.correct), 0)::int AS correct_attempts`;

const CARD_ATTEMPTS = `LEFT JOIN LATERAL (SELECT COUNT(*) AS attempts, COUNT(*) FILTER (WHERE correct) AS correct
  FROM catchup_answers WHERE card_id = c.id) a ON true`;

interface CatchupCounts {
  student_count: number;
  started_count: number;
  card_count: number;
  cleared_count: number;
  box1: number;
  box2: number;
  box3: number;
  box4: number;
  box5: number;
  attempts: number;
  correct_attempts: number;
}

function cardResult(r: CardRow, items: readonly SessionItem[]): CatchupCardResultDto {
  return {
    itemId: r.item_id,
    prompt: items.find((i) => i.id === r.item_id)?.prompt ?? '',
    box: r.box,
    dueAt: r.due_at.toISOString(),
    attempts: r.attempts,
    correctAttempts: r.correct_attempts,
    lastCorrect: r.last_correct,
    lastAnsweredAt: r.last_answered_at?.toISOString() ?? null,
  };
}

const share = (part: number, whole: number, reason: string): FigureDto => (whole > 0 ? computed(part / whole) : notComputed(reason));

const iso = (ms: number | null): string | null => (ms === null ? null : new Date(ms).toISOString());

/** Catch-ups: built by the teacher from a debrief's missed items, played by each student alone. */
@Injectable()
export class CatchupService {
  constructor(
    @InjectDataSource() private readonly db: DataSource,
    @Inject(appConfig.KEY) private readonly config: ConfigType<typeof appConfig>,
    @Inject(CATCHUP_CLOCK) private readonly clock: CatchupClock,
    private readonly debriefs: DebriefService,
    private readonly limiter: JoinAttemptLimiter,
  ) {}

  // ---- Teacher ----

  /** One card per missed item (credit < 1) of each student who joined from the class list. */
  async create(user: UserEntity, sessionId: string): Promise<CreateCatchupResponse> {
    const session = await this.debriefs.readable(user, sessionId);
    if (session.status !== 'ended') {
      throw new ApiException(HttpStatus.CONFLICT, 'session_not_ended', 'A catch-up can be made once the session has ended.');
    }
    const classId = session.classId;
    if (!classId) {
      throw new ApiException(HttpStatus.CONFLICT, 'not_a_class_session', 'A catch-up needs a session played by a class: students find their name on its list.');
    }
    const planned = planCards((await this.debriefs.debrief(user, sessionId)).students);
    // A roster entry deleted since the session has no one to come back as.
    const entryIds = [...new Set(planned.map((p) => p.rosterEntryId))];
    const present = new Set(
      entryIds.length ? (await this.db.getRepository(RosterEntryEntity).find({ where: { id: In(entryIds), classId }, select: { id: true } })).map((e) => e.id) : [],
    );
    const cards = planned.filter((p) => present.has(p.rosterEntryId));
    if (cards.length === 0) {
      throw new ApiException(HttpStatus.CONFLICT, 'nothing_missed', 'No student from the class list missed an item in this session: there is nothing to catch up on.');
    }
    const start = newCard(this.clock.now());
    return this.db.transaction(async (m) => {
      const code = await this.freshCode(m);
      const catchup = await m.getRepository(CatchupEntity).save({ sessionId, classId, code, createdById: user.id, closedAt: null });
      await m.getRepository(CatchupCardEntity).insert(
        cards.map((c) => ({ catchupId: catchup.id, rosterEntryId: c.rosterEntryId, itemId: c.itemId, box: start.box, dueAt: new Date(start.dueAt), lastAnsweredAt: null })),
      );
      return { id: catchup.id, code, cardCount: cards.length };
    });
  }

  private async freshCode(m: EntityManager): Promise<string> {
    for (let i = 0; i < CODE_ATTEMPTS; i++) {
      const code = newJoinCode();
      if (!(await m.getRepository(CatchupEntity).exists({ where: { code, closedAt: IsNull() } }))) return code;
    }
    throw new ApiException(HttpStatus.SERVICE_UNAVAILABLE, 'no_code', 'Could not find a free code. Try again.');
  }

  /** Per student: each card's box, attempts and last result. Same readers as the debrief; 404 for everyone else. */
  async results(user: UserEntity, sessionId: string, catchupId: string): Promise<CatchupResultsDto> {
    const session = await this.debriefs.readable(user, sessionId);
    const catchup = await this.db.getRepository(CatchupEntity).findOne({ where: { id: catchupId, sessionId } });
    if (!catchup) throw notFound();
    const rows: (CardRow & { display_name: string })[] = await this.db.query(
      `SELECT re.display_name, ${CARD_COLUMNS}
       FROM catchup_cards c JOIN roster_entries re ON re.id = c.roster_entry_id
       WHERE c.catchup_id = $1
       ORDER BY re.display_name, c.roster_entry_id`,
      [catchup.id],
    );
    const position = new Map(session.items.map((item, i) => [item.id, i]));
    const students = new Map<string, CatchupStudentResultDto>();
    for (const r of rows) {
      let s = students.get(r.roster_entry_id);
      if (!s) students.set(r.roster_entry_id, (s = { rosterEntryId: r.roster_entry_id, displayName: r.display_name, items: [] }));
      s.items.push(cardResult(r, session.items));
    }
    for (const s of students.values()) s.items.sort((a, b) => (position.get(a.itemId) ?? 0) - (position.get(b.itemId) ?? 0));
    return {
      id: catchup.id,
      sessionId,
      code: catchup.code,
      createdAt: catchup.createdAt.toISOString(),
      closedAt: catchup.closedAt?.toISOString() ?? null,
      students: [...students.values()],
    };
  }

  /** `GET /api/sessions/:id/catchups`: the session's catch-ups, oldest first. */
  async list(user: UserEntity, sessionId: string): Promise<CatchupSummaryDto[]> {
    await this.debriefs.readable(user, sessionId);
    return this.summaries('k.session_id = $1', [sessionId]);
  }

  /** Closes a catch-up: its code stops working; its results stay. Closing twice changes nothing. */
  async close(user: UserEntity, sessionId: string, catchupId: string): Promise<CatchupSummaryDto> {
    await this.debriefs.readable(user, sessionId);
    const repo = this.db.getRepository(CatchupEntity);
    const catchup = await repo.findOne({ where: { id: catchupId, sessionId } });
    if (!catchup) throw notFound();
    if (catchup.closedAt === null) await repo.update({ id: catchup.id, closedAt: IsNull() }, { closedAt: new Date(this.clock.now()) });
    const [summary] = await this.summaries('k.id = $1', [catchup.id]);
    return summary!;
  }

  /** A class's catch-ups for the class page. The caller has checked access to the class. */
  forClass(classId: string): Promise<CatchupSummaryDto[]> {
    return this.summaries('k.class_id = $1', [classId]);
  }

  private async summaries(where: string, params: unknown[]): Promise<CatchupSummaryDto[]> {
    const rows: (CatchupCounts & { id: string; session_id: string; bank_title: string; code: string; created_at: Date; closed_at: Date | null })[] =
      await this.db.query(
        `SELECT k.id, k.session_id, s.bank_title, k.code, k.created_at, k.closed_at, ${CARD_COUNTS}
         FROM catchups k JOIN sessions s ON s.id = k.session_id
         LEFT JOIN catchup_cards c ON c.catchup_id = k.id
         ${CARD_ATTEMPTS}
         WHERE ${where}
         GROUP BY k.id, s.bank_title
         ORDER BY k.created_at, k.id`,
        params,
      );
    return rows.map((r) => ({
      id: r.id,
      sessionId: r.session_id,
      bankTitle: r.bank_title,
      code: r.code,
      createdAt: r.created_at.toISOString(),
      closedAt: r.closed_at?.toISOString() ?? null,
      studentCount: r.student_count,
      startedCount: r.started_count,
      cardCount: r.card_count,
      clearedCount: r.cleared_count,
      boxCounts: [r.box1, r.box2, r.box3, r.box4, r.box5],
      attempts: r.attempts,
      correctAttempts: r.correct_attempts,
      accuracy: share(r.correct_attempts, r.attempts, 'No catch-up answers yet.'),
    }));
  }

  /** Per roster entry of the class: cards still in box 1 of open catch-ups (they can still play them), and cleared (box 2 or higher). */
  async cardCountsByStudent(classId: string): Promise<Map<string, { open: number; cleared: number }>> {
    const rows: { roster_entry_id: string; open: number; cleared: number }[] = await this.db.query(
      `SELECT c.roster_entry_id, COUNT(*) FILTER (WHERE c.box = 1 AND k.closed_at IS NULL)::int AS open, COUNT(*) FILTER (WHERE c.box >= 2)::int AS cleared
       FROM catchup_cards c JOIN catchups k ON k.id = c.catchup_id
       WHERE k.class_id = $1 GROUP BY c.roster_entry_id`,
      [classId],
    );
    return new Map(rows.map((r) => [r.roster_entry_id, { open: r.open, cleared: r.cleared }]));
  }

  /** One student's cards in the class's catch-ups, oldest catch-up first. The caller has checked access to the class. */
  async forStudent(classId: string, rosterEntryId: string): Promise<StudentCatchupDto[]> {
    const rows: (CardRow & { catchup_id: string; session_id: string; created_at: Date; closed_at: Date | null })[] = await this.db.query(
      `SELECT k.id AS catchup_id, k.session_id, k.created_at, k.closed_at, ${CARD_COLUMNS}
       FROM catchup_cards c JOIN catchups k ON k.id = c.catchup_id
       WHERE k.class_id = $1 AND c.roster_entry_id = $2
       ORDER BY k.created_at, k.id`,
      [classId, rosterEntryId],
    );
    const sessionIds = [...new Set(rows.map((r) => r.session_id))];
    const sessions = new Map(
      (sessionIds.length ? await this.db.getRepository(SessionEntity).find({ where: { id: In(sessionIds) }, select: { id: true, bankTitle: true, items: true } }) : []).map(
        (s) => [s.id, s],
      ),
    );
    const out = new Map<string, StudentCatchupDto>();
    for (const r of rows) {
      const session = sessions.get(r.session_id);
      let k = out.get(r.catchup_id);
      if (!k) {
        out.set(
          r.catchup_id,
          (k = {
            catchupId: r.catchup_id,
            sessionId: r.session_id,
            bankTitle: session?.bankTitle ?? '',
            createdAt: r.created_at.toISOString(),
            closedAt: r.closed_at?.toISOString() ?? null,
            cardCount: 0,
            clearedCount: 0,
            attempts: 0,
            correctAttempts: 0,
            items: [],
          }),
        );
      }
      k.cardCount += 1;
      if (r.box >= 2) k.clearedCount += 1;
      k.attempts += r.attempts;
      k.correctAttempts += r.correct_attempts;
      k.items.push(cardResult(r, session?.items ?? []));
    }
    for (const k of out.values()) {
      const position = new Map((sessions.get(k.sessionId)?.items ?? []).map((item, i) => [item.id, i]));
      k.items.sort((a, b) => (position.get(a.itemId) ?? 0) - (position.get(b.itemId) ?? 0));
    }
    return [...out.values()];
  }

  // ---- Student (public) ----

  /** The open catch-up behind a typed code; a miss counts as a guess for the rate limit. */
  private async open(rawCode: string, client: string): Promise<CatchupEntity> {
    const code = normaliseJoinCode(rawCode);
    const catchup = code ? await this.db.getRepository(CatchupEntity).findOne({ where: { code, closedAt: IsNull() } }) : null;
    if (catchup) return catchup;
    this.limiter.recordFailure(client);
    throw new ApiException(HttpStatus.NOT_FOUND, 'unknown_code', 'No catch-up has that code. Check the link from your teacher and try again.');
  }

  private async sessionOf(catchup: CatchupEntity): Promise<SessionEntity> {
    const session = await this.db.getRepository(SessionEntity).findOne({ where: { id: catchup.sessionId } });
    if (!session) throw notFound();
    return session;
  }

  async info(rawCode: string, client: string): Promise<CatchupInfoResponse> {
    const catchup = await this.open(rawCode, client);
    const session = await this.sessionOf(catchup);
    const students: { id: string; display_name: string }[] = await this.db.query(
      `SELECT re.id, re.display_name FROM roster_entries re
       WHERE re.id IN (SELECT roster_entry_id FROM catchup_cards WHERE catchup_id = $1)
       ORDER BY re.display_name, re.id`,
      [catchup.id],
    );
    return { ok: true, title: session.bankTitle, students: students.map((s) => ({ rosterEntryId: s.id, displayName: s.display_name })) };
  }

  async start(rawCode: string, rosterEntryId: string, client: string): Promise<CatchupStartResponse> {
    const catchup = await this.open(rawCode, client);
    const cards = await this.db.getRepository(CatchupCardEntity).find({ where: { catchupId: catchup.id, rosterEntryId } });
    const entry = cards.length ? await this.db.getRepository(RosterEntryEntity).findOne({ where: { id: rosterEntryId } }) : null;
    if (!entry) throw new ApiException(HttpStatus.BAD_REQUEST, 'unknown_roster_entry', 'That name has nothing to catch up on here.');
    const session = await this.sessionOf(catchup);
    const items = new Map(session.items.map((i) => [i.id, i]));
    const now = this.clock.now();
    const due = dueCards(
      cards.map((c) => ({ id: c.id, card: leitner(c), row: c })),
      now,
    );
    return {
      ok: true,
      token: signCatchupToken(this.config.secret, { catchupId: catchup.id, rosterEntryId: entry.id }),
      displayName: entry.displayName,
      title: session.bankTitle,
      items: due.flatMap(({ row }) => {
        const item = items.get(row.itemId);
        return item ? [catchupItemView(item, row.box, `${catchup.id}:${row.id}`)] : [];
      }),
      nextDueAt: iso(earliestDue(cards.map((c) => ({ dueAt: c.dueAt.getTime() })))),
    };
  }

  /** Scores one answer and moves the card by the Leitner rule; a card not due yet is refused. */
  async answer(dto: CatchupAnswerDto, client: string): Promise<CatchupAnswerResponse> {
    const claims = verifyCatchupToken(this.config.secret, dto.token);
    if (!claims) {
      this.limiter.recordFailure(client);
      throw new ApiException(HttpStatus.UNAUTHORIZED, 'invalid_token', 'This catch-up link has expired. Open it again and pick your name.');
    }
    const now = this.clock.now();
    return this.db.transaction(async (m) => {
      const catchup = await m.getRepository(CatchupEntity).findOne({ where: { id: claims.catchupId } });
      if (!catchup) throw notFound();
      if (catchup.closedAt !== null) throw new ApiException(HttpStatus.GONE, 'catchup_closed', 'Your teacher has closed this catch-up.');
      // The row lock makes a double tap count once: the second attempt finds the card no longer due.
      const card = await m.getRepository(CatchupCardEntity).findOne({
        where: { catchupId: catchup.id, rosterEntryId: claims.rosterEntryId, itemId: dto.itemId },
        lock: { mode: 'pessimistic_write' },
      });
      const session = card ? await m.getRepository(SessionEntity).findOne({ where: { id: catchup.sessionId } }) : null;
      const item: SessionItem | undefined = session?.items.find((i) => i.id === dto.itemId);
      if (!card || !item) throw notFound('That item is not in your catch-up.');
      if (!isDue(leitner(card), now)) {
        throw new ApiException(HttpStatus.CONFLICT, 'card_not_due', `Not due yet: this item comes back for review on ${card.dueAt.toISOString().slice(0, 10)}.`);
      }
      const parsed = parseResponse(dto.response, item);
      if (!parsed.ok) throw new ApiException(HttpStatus.BAD_REQUEST, parsed.error, parsed.message, [{ field: 'response', message: parsed.message }]);
      const { credit } = checkAnswer(item, parsed.value);
      const correct = isCorrect(credit);
      const next = review(leitner(card), correct, now);
      await m.getRepository(CatchupCardEntity).update(card.id, { box: next.box, dueAt: new Date(next.dueAt), lastAnsweredAt: new Date(now) });
      await m.getRepository(CatchupAnswerEntity).insert({ cardId: card.id, response: parsed.value, credit, correct, answeredAt: new Date(now) });
      const all = await m.getRepository(CatchupCardEntity).find({ where: { catchupId: catchup.id, rosterEntryId: claims.rosterEntryId }, select: { id: true, dueAt: true } });
      return {
        ok: true,
        credit,
        correct,
        key: item.key,
        explanation: item.explanation,
        box: next.box,
        dueAt: new Date(next.dueAt).toISOString(),
        nextDueAt: iso(earliestDue(all.map((c) => ({ dueAt: c.dueAt.getTime() }))))!,
      };
    });
  }
}
