import { HttpStatus, Inject, Injectable } from '@nestjs/common';
import { ConfigType } from '@nestjs/config';
import { InjectDataSource } from '@nestjs/typeorm';
import type {
  CatchupAnswerResponse,
  CatchupBox,
  CatchupInfoResponse,
  CatchupResultsDto,
  CatchupStartResponse,
  CatchupStudentResultDto,
  CreateCatchupResponse,
} from '@covalent/shared-types';
import { DataSource, EntityManager, In, IsNull } from 'typeorm';
import { RosterEntryEntity } from '../classes/entities/roster-entry.entity';
import { ApiException } from '../common/api-error';
import { appConfig } from '../config/app.config';
import { DebriefService } from '../debrief/debrief.service';
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
    const rows: {
      roster_entry_id: string;
      display_name: string;
      item_id: string;
      box: CatchupBox;
      due_at: Date;
      last_answered_at: Date | null;
      attempts: number;
      last_correct: boolean | null;
    }[] = await this.db.query(
      `SELECT c.roster_entry_id, re.display_name, c.item_id, c.box, c.due_at, c.last_answered_at,
              (SELECT COUNT(*)::int FROM catchup_answers a WHERE a.card_id = c.id) AS attempts,
              (SELECT a.correct FROM catchup_answers a WHERE a.card_id = c.id ORDER BY a.answered_at DESC, a.created_at DESC LIMIT 1) AS last_correct
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
      s.items.push({
        itemId: r.item_id,
        prompt: session.items[position.get(r.item_id) ?? -1]?.prompt ?? '',
        box: r.box,
        dueAt: r.due_at.toISOString(),
        attempts: r.attempts,
        lastCorrect: r.last_correct,
        lastAnsweredAt: r.last_answered_at?.toISOString() ?? null,
      });
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
