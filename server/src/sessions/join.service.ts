import { HttpStatus, Inject, Injectable } from '@nestjs/common';
import { ConfigType } from '@nestjs/config';
import { InjectDataSource } from '@nestjs/typeorm';
import type { JoinInfoResponse, JoinResponse } from '@covalent/shared-types';
import { DataSource } from 'typeorm';
import { RosterEntryEntity } from '../classes/entities/roster-entry.entity';
import { ApiException } from '../common/api-error';
import { appConfig } from '../config/app.config';
import { JoinDto } from './dto/join.dto';
import { normaliseJoinCode } from './join-code';
import { JoinAttemptLimiter } from './join-rate-limit.guard';
import type { LiveSession } from './live/live-session';
import { LiveSessionsService } from './live/live-sessions.service';
import { checkNickname, nicknameKey } from './nickname';
import { signPlayerToken } from './player-token';
import { SessionsService } from './sessions.service';

const STATUS_OF: Record<string, HttpStatus> = {
  session_ended: HttpStatus.GONE,
  joining_locked: HttpStatus.FORBIDDEN,
  nickname_taken: HttpStatus.CONFLICT,
  roster_entry_taken: HttpStatus.CONFLICT,
  storage_unavailable: HttpStatus.SERVICE_UNAVAILABLE,
};

/** Students joining with a code: the two public play routes. */
@Injectable()
export class JoinService {
  constructor(
    @InjectDataSource() private readonly db: DataSource,
    @Inject(appConfig.KEY) private readonly config: ConfigType<typeof appConfig>,
    private readonly live: LiveSessionsService,
    private readonly sessions: SessionsService,
    private readonly limiter: JoinAttemptLimiter,
  ) {}

  /** The live session behind a typed code; 404 (counted as a guess) or 410. */
  private async find(rawCode: string, client: string): Promise<LiveSession> {
    const code = normaliseJoinCode(rawCode);
    const s = code ? this.live.byJoinCode(code) : undefined;
    if (s && s.engine.status !== 'ended') return s;
    if (code && (await this.sessions.endedWithCode(code))) {
      throw new ApiException(HttpStatus.GONE, 'session_ended', 'That session has ended. Ask your teacher for the new code.');
    }
    this.limiter.recordFailure(client);
    throw new ApiException(HttpStatus.NOT_FOUND, 'unknown_code', 'No session has that code. Check the code on the board and try again.');
  }

  async info(rawCode: string, client: string): Promise<JoinInfoResponse> {
    const s = await this.find(rawCode, client);
    let roster: JoinInfoResponse['roster'] = null;
    if (s.meta.classId) {
      const taken = new Set(s.activePlayers().map((p) => p.rosterEntryId));
      const entries = await this.db.getRepository(RosterEntryEntity).find({ where: { classId: s.meta.classId }, order: { displayName: 'ASC' } });
      roster = entries.map((e) => ({ id: e.id, displayName: e.displayName, taken: taken.has(e.id) }));
    }
    return { ok: true, sessionTitle: s.meta.bankTitle, roster, joiningLocked: s.meta.joiningLocked };
  }

  async join(dto: JoinDto, client: string): Promise<JoinResponse> {
    const s = await this.find(dto.code, client);
    if (s.meta.joiningLocked) throw new ApiException(HttpStatus.FORBIDDEN, 'joining_locked', 'The teacher has closed joining for this session.');
    let input;
    if (dto.rosterEntryId) {
      const entry = s.meta.classId
        ? await this.db.getRepository(RosterEntryEntity).findOne({ where: { id: dto.rosterEntryId, classId: s.meta.classId } })
        : null;
      if (!entry) throw new ApiException(HttpStatus.BAD_REQUEST, 'unknown_roster_entry', 'That name is not on this class list.');
      input = {
        nickname: entry.displayName,
        nicknameKey: nicknameKey(entry.displayName),
        rosterEntryId: entry.id,
        tableGroup: entry.tableGroup,
        timeMultiplier: entry.timeMultiplier,
      };
    } else {
      const checked = checkNickname(dto.nickname);
      if (!checked.ok) throw new ApiException(HttpStatus.BAD_REQUEST, checked.error, checked.message, [{ field: 'nickname', message: checked.message }]);
      input = { nickname: checked.nickname, nicknameKey: checked.key, rosterEntryId: null, tableGroup: null, timeMultiplier: 1 };
    }
    const joined = await this.live.join(s, input);
    if ('ok' in joined) throw new ApiException(STATUS_OF[joined.error] ?? HttpStatus.BAD_REQUEST, joined.error, joined.message);
    return {
      ok: true,
      sessionId: s.id,
      playerId: joined.id,
      playerToken: signPlayerToken(this.config.secret, { sessionId: s.id, playerId: joined.id, tokenVersion: joined.tokenVersion }),
    };
  }
}
