import { HttpStatus, Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { classLabel } from '@covalent/shared-types';
import type { SessionDto } from '@covalent/shared-types';
import { randomBytes, randomUUID } from 'node:crypto';
import { DataSource, In, QueryFailedError } from 'typeorm';
import { BanksService } from '../banks/banks.service';
import { ItemEntity } from '../banks/entities/item.entity';
import { ClassesService } from '../classes/classes.service';
import { ClassCoTeacherEntity } from '../classes/entities/class-co-teacher.entity';
import { ClassEntity } from '../classes/entities/class.entity';
import { ApiException } from '../common/api-error';
import { UserEntity } from '../users/entities/user.entity';
import { CreateSessionDto } from './dto/create-session.dto';
import { SessionEntity, type SessionItem } from './entities/session.entity';
import { newJoinCode } from './join-code';
import type { LiveSessionMeta } from './live/live-session';
import { LiveSessionsService } from './live/live-sessions.service';
import { sessionDto } from './live/session-views';
import { encodeSnapshot } from './live/snapshot-codec';

const JOIN_CODE_ATTEMPTS = 10;
const notFound = () => new ApiException(HttpStatus.NOT_FOUND, 'not_found', 'No such session.');

/** Who may run a session: its owner, the class's owner or co-teachers, or an admin of its school. */
export interface HostableSession {
  ownerId: string;
  classId: string | null;
  schoolId: string;
}

/** Setting sessions up and listing them (REST); the live part is LiveSessionsService. */
@Injectable()
export class SessionsService {
  constructor(
    @InjectDataSource() private readonly db: DataSource,
    private readonly banks: BanksService,
    private readonly classes: ClassesService,
    private readonly live: LiveSessionsService,
  ) {}

  async canHost(user: UserEntity, s: HostableSession): Promise<boolean> {
    if (user.schoolId !== s.schoolId) return false;
    if (s.ownerId === user.id || user.role === 'admin') return true;
    if (!s.classId) return false;
    const cls = await this.db.getRepository(ClassEntity).findOne({ where: { id: s.classId } });
    if (cls?.ownerId === user.id) return true;
    return this.db.getRepository(ClassCoTeacherEntity).exists({ where: { classId: s.classId, userId: user.id } });
  }

  async create(user: UserEntity, dto: CreateSessionDto): Promise<SessionDto> {
    const { bank } = await this.banks.access(user, dto.bankId, 'read');
    let className: string | null = null;
    if (dto.classId) {
      const { cls, access } = await this.classes.access(user, dto.classId, 'read');
      if (access === 'admin') {
        throw new ApiException(HttpStatus.FORBIDDEN, 'forbidden', "Only the class's teacher or a co-teacher can run a session for it.");
      }
      className = classLabel(cls);
    }
    const items = await this.pickItems(bank.id, dto.itemIds);
    const meta: LiveSessionMeta = {
      id: randomUUID(),
      ownerId: user.id,
      schoolId: user.schoolId,
      classId: dto.classId ?? null,
      className,
      bankId: bank.id,
      bankTitle: bank.title,
      joinCode: '',
      format: dto.format,
      settings: {
        roundSeconds: dto.roundSeconds,
        speedWeight: dto.speedWeight,
        standings: dto.standings,
        teamCount: dto.teamCount ?? null,
        targetTeamSize: dto.targetTeamSize ?? null,
        mixerMode: dto.mixerMode,
        namePack: dto.namePack,
      },
      items,
      seed: randomBytes(16).toString('hex'),
      mixerSeed: null,
      mixerSummary: null,
      joiningLocked: false,
      createdAt: new Date(),
      startedAt: null,
      endedAt: null,
    };
    const s = this.live.prepare(meta);
    const repo = this.db.getRepository(SessionEntity);
    for (let attempt = 1; ; attempt++) {
      meta.joinCode = newJoinCode();
      try {
        const row = await repo.save(
          repo.create({
            ...meta,
            itemIds: items.map((i) => i.id),
            status: 'lobby',
            snapshot: encodeSnapshot(s.engine.toSnapshot()),
            snapshotVersion: 1,
            snapshotSeq: '0',
            snapshotAt: new Date(),
          }),
        );
        meta.createdAt = row.createdAt;
        break;
      } catch (err) {
        const e = err instanceof QueryFailedError ? (err.driverError as { code?: string; constraint?: string }) : null;
        if (e?.code === '23505' && e.constraint === 'sessions_join_code_live_key' && attempt < JOIN_CODE_ATTEMPTS) continue;
        throw err;
      }
    }
    this.live.adopt(s);
    return sessionDto(s);
  }

  /** The bank's items in bank order, or the chosen ones in the chosen order; copied so bank edits do not change the session. */
  private async pickItems(bankId: string, itemIds: string[] | undefined): Promise<SessionItem[]> {
    const repo = this.db.getRepository(ItemEntity);
    const rows = itemIds ? await repo.find({ where: { bankId, id: In(itemIds) } }) : await repo.find({ where: { bankId }, order: { position: 'ASC' } });
    if (itemIds && rows.length !== itemIds.length) {
      throw new ApiException(HttpStatus.BAD_REQUEST, 'unknown_items', 'Some of the chosen items are not in this bank.');
    }
    if (rows.length === 0) throw new ApiException(HttpStatus.BAD_REQUEST, 'no_items', 'This bank has no items to play yet.');
    const byId = new Map(rows.map((r) => [r.id, r]));
    const ordered = itemIds ? itemIds.map((id) => byId.get(id) as ItemEntity) : rows;
    return ordered.map((r) => ({
      id: r.id,
      type: r.type,
      prompt: r.prompt,
      options: r.options,
      key: r.key,
      explanation: r.explanation,
      tags: r.tags,
      imageId: r.imageId,
    }));
  }

  /** The user's own sessions and those of classes they teach, newest first. */
  async list(user: UserEntity): Promise<SessionDto[]> {
    const ids: { id: string }[] = await this.db.query(
      `SELECT s.id FROM sessions s
       WHERE s.school_id = $2 AND (s.owner_id = $1
          OR s.class_id IN (SELECT id FROM classes WHERE owner_id = $1 UNION SELECT class_id FROM class_co_teachers WHERE user_id = $1))
       ORDER BY s.created_at DESC LIMIT 200`,
      [user.id, user.schoolId],
    );
    return this.toDtos(ids.map((r) => r.id));
  }

  async detail(user: UserEntity, id: string): Promise<SessionDto> {
    const row = await this.db.getRepository(SessionEntity).findOne({ where: { id } });
    if (!row || !(await this.canHost(user, row))) throw notFound();
    return (await this.toDtos([id]))[0];
  }

  private async toDtos(ids: string[]): Promise<SessionDto[]> {
    if (ids.length === 0) return [];
    const rows = await this.db.getRepository(SessionEntity).find({ where: { id: In(ids) }, relations: { class: true } });
    const counts: { session_id: string; n: number }[] = await this.db.query(
      'SELECT session_id, COUNT(*)::int AS n FROM session_players WHERE session_id = ANY($1) AND removed_at IS NULL GROUP BY session_id',
      [ids],
    );
    const count = new Map(counts.map((c) => [c.session_id, c.n]));
    const byId = new Map(rows.map((r) => [r.id, r]));
    return ids
      .map((id) => byId.get(id))
      .filter((r): r is SessionEntity => !!r)
      .map((row) => {
        const live = this.live.get(row.id);
        if (live) return sessionDto(live);
        return {
          id: row.id,
          joinCode: row.joinCode,
          status: row.status,
          bankId: row.bankId ?? '',
          bankTitle: row.bankTitle,
          classId: row.classId,
          className: row.class ? classLabel(row.class) : null,
          format: row.format,
          roundSeconds: row.settings.roundSeconds,
          speedWeight: row.settings.speedWeight,
          standings: row.settings.standings,
          mixerMode: row.settings.mixerMode,
          namePack: row.settings.namePack,
          itemCount: row.itemIds.length,
          playerCount: count.get(row.id) ?? 0,
          createdAt: row.createdAt.toISOString(),
          endedAt: row.endedAt?.toISOString() ?? null,
        };
      });
  }

  /** Whether a code belonged to a session that has ended (for a 410 instead of a 404). */
  async endedWithCode(code: string): Promise<boolean> {
    return this.db.getRepository(SessionEntity).exists({ where: { joinCode: code, status: 'ended' } });
  }

  async statusOf(id: string): Promise<SessionEntity['status'] | null> {
    const row = await this.db.getRepository(SessionEntity).findOne({ where: { id }, select: { id: true, status: true } });
    return row?.status ?? null;
  }
}
