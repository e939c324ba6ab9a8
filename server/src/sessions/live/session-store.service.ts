import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { classLabel } from '@covalent/shared-types';
import type { ItemResponse } from '@covalent/shared-types';
import { DataSource, EntityManager, In, Not } from 'typeorm';
import type { PostgresDriver } from 'typeorm/driver/postgres/PostgresDriver';
import { ClassEntity } from '../../classes/entities/class.entity';
import { PairRuleEntity } from '../../classes/entities/pair-rule.entity';
import type { PairingHistory } from '../../mixer/domain';
import { ResponseEntity, type ResponseKind } from '../entities/response.entity';
import { SessionPlayerEntity } from '../entities/session-player.entity';
import { SessionTeamEntity } from '../entities/session-team.entity';
import { SessionEntity } from '../entities/session.entity';
import type { LivePlayer, LiveSession, LiveTeam } from './live-session';
import { encodeSnapshot } from './snapshot-codec';

/** How many of the class's past sessions the Mixer looks back over (DESIGN.md §4: "the last K sessions"). */
export const HISTORY_SESSIONS = 5;

export interface NewResponse {
  sessionId: string;
  roundIndex: number;
  playerId: string;
  teamId: string | null;
  clientMessageId: string;
  kind: ResponseKind;
  response: ItemResponse | null;
  locked: boolean;
  elapsedMs: number;
  receivedAt: number;
}

export interface StoredResponse {
  seq: number;
  playerId: string;
  roundIndex: number;
  clientMessageId: string;
  kind: ResponseKind;
  response: ItemResponse | null;
  locked: boolean;
  receivedAt: number;
}

export interface LoadedSession {
  row: SessionEntity;
  className: string | null;
  players: SessionPlayerEntity[];
  teams: SessionTeamEntity[];
  /** Responses after the snapshot, in arrival order. */
  pending: StoredResponse[];
}

export interface MixerContext {
  keepApart: [string, string][];
  keepTogether: [string, string][];
  history: PairingHistory[];
  priors: Map<string, number>;
}

const toPlayerRow = (p: LivePlayer) => ({
  id: p.id,
  teamId: p.teamId,
  number: p.number,
  nickname: p.nickname,
  tokenVersion: p.tokenVersion,
});

/** Every database read and write of the live runtime. */
@Injectable()
export class SessionStore {
  constructor(@InjectDataSource() private readonly db: DataSource) {}

  transaction<T>(fn: (m: EntityManager) => Promise<T>): Promise<T> {
    return this.db.transaction(fn);
  }

  /**
   * The pg pool under TypeORM. The answer path's single statement goes to it directly: TypeORM's
   * query runner per call (acquire, log, broadcast, release) was a visible share of the server's
   * time per answer in the bench profile. Same pool, same connections, same errors.
   */
  private get pool(): { query(sql: string, params: unknown[]): Promise<{ rows: { seq: string }[] }> } {
    return (this.db.driver as PostgresDriver).master;
  }

  /** Inserts an accepted answer; null when (player, clientMessageId) is already stored. Committed when this resolves. */
  async insertResponse(r: NewResponse): Promise<{ seq: number } | null> {
    const { rows } = await this.pool.query(
      `INSERT INTO responses (session_id, round_index, player_id, team_id, client_message_id, kind, response, locked, elapsed_ms, received_at)
       VALUES ($1, $2, $3, $4, $5, $6, $7::jsonb, $8, $9, $10)
       ON CONFLICT (player_id, client_message_id) DO NOTHING
       RETURNING seq`,
      [r.sessionId, r.roundIndex, r.playerId, r.teamId, r.clientMessageId, r.kind, r.response === null ? null : JSON.stringify(r.response), r.locked, Math.round(r.elapsedMs), new Date(r.receivedAt)],
    );
    return rows.length ? { seq: Number(rows[0].seq) } : null;
  }

  async findResponse(playerId: string, clientMessageId: string): Promise<{ roundIndex: number; locked: boolean; receivedAt: number } | null> {
    const row = await this.db.getRepository(ResponseEntity).findOne({ where: { playerId, clientMessageId } });
    return row ? { roundIndex: row.roundIndex, locked: row.locked, receivedAt: row.receivedAt.getTime() } : null;
  }

  /**
   * The engine snapshot (with the last response it contains), the session's own
   * fields, the rounds, and the results of rounds newly revealed (or, at the end,
   * closed), inside the caller's transaction. Returns the rounds whose results it stored.
   */
  async saveState(s: LiveSession, m: EntityManager): Promise<number[]> {
    // Everything is read from the live state before this function's first await, so no copy is needed.
    // Nothing changes the state meanwhile because every caller runs inside the session's queue
    // (persist waits for its transaction to begin before calling this, which the queue makes safe).
    const state = s.engine.peekState();
    const snapshotJson = JSON.stringify(encodeSnapshot(state));
    const status = state.status;
    const at = (ms: number | null) => (ms === null ? null : new Date(ms));
    const rounds = state.rounds;
    const roundColumns = [
      rounds.map((r) => r.index),
      rounds.map((r) => r.itemId),
      rounds.map((r) => r.status),
      rounds.map((r) => at(r.openedAt)),
      rounds.map((r) => at(r.closedAt)),
      rounds.map((r) => at(r.revealedAt)),
      rounds.map((r) => r.closeReason),
    ];
    const results = rounds
      .filter((r) => r.results && (r.status === 'revealed' || status === 'ended') && !s.resultsStored.has(r.index))
      .map((r) => ({ index: r.index, answered: r.results!.players.filter((p) => p.answered).map((p) => ({ ...p })) }));
    const resultRounds = results.map((r) => r.index);
    const meta = s.meta;
    await m.query(
      `UPDATE sessions SET status = $2, snapshot = $3::jsonb, snapshot_seq = $4, snapshot_at = now(), joining_locked = $5,
         mixer_seed = $6, mixer_summary = $7::jsonb, started_at = $8, ended_at = $9, updated_at = now()
       WHERE id = $1`,
      [meta.id, status, snapshotJson, s.lastSeq, meta.joiningLocked, meta.mixerSeed,
        meta.mixerSummary === null ? null : JSON.stringify(meta.mixerSummary), meta.startedAt, meta.endedAt],
    );
    if (rounds.length) {
      await m.query(
        `INSERT INTO session_rounds (session_id, "index", item_id, status, opened_at, closed_at, revealed_at, close_reason)
         SELECT $1, * FROM unnest($2::int[], $3::uuid[], $4::text[], $5::timestamptz[], $6::timestamptz[], $7::timestamptz[], $8::text[])
         ON CONFLICT (session_id, "index") DO UPDATE SET status = EXCLUDED.status, opened_at = EXCLUDED.opened_at,
           closed_at = EXCLUDED.closed_at, revealed_at = EXCLUDED.revealed_at, close_reason = EXCLUDED.close_reason, updated_at = now()`,
        [meta.id, ...roundColumns],
      );
    }
    for (const { index, answered } of results) {
      // Each player's last answer of the round is the one that counted.
      await m.query(
        `UPDATE responses r SET credit = v.credit, correct = v.correct, points = v.points, final = true, updated_at = now()
         FROM (SELECT DISTINCT ON (player_id) id, player_id FROM responses
               WHERE session_id = $1 AND round_index = $2 AND kind = 'answer' ORDER BY player_id, seq DESC) last
         JOIN unnest($3::uuid[], $4::float8[], $5::bool[], $6::int[]) AS v(player_id, credit, correct, points) ON v.player_id = last.player_id
         WHERE r.id = last.id`,
        [meta.id, index, answered.map((p) => p.playerId), answered.map((p) => p.credit), answered.map((p) => p.correct), answered.map((p) => p.points)],
      );
    }
    return resultRounds;
  }

  async insertPlayer(
    m: EntityManager,
    row: Pick<SessionPlayerEntity, 'sessionId' | 'nickname' | 'nicknameKey' | 'rosterEntryId' | 'tableGroup' | 'timeMultiplier'>,
  ): Promise<SessionPlayerEntity> {
    const repo = m.getRepository(SessionPlayerEntity);
    return repo.save(repo.create({ ...row, teamId: null, number: null, status: 'connected', removedAt: null, tokenVersion: 1 }));
  }

  async savePlayers(m: EntityManager, s: LiveSession, players: LivePlayer[]): Promise<void> {
    for (const p of players) {
      const status = s.statusOf(p.id);
      await m.getRepository(SessionPlayerEntity).update({ id: p.id }, { ...toPlayerRow(p), status });
    }
  }

  async removePlayer(m: EntityManager, playerId: string, tokenVersion: number): Promise<void> {
    await m.getRepository(SessionPlayerEntity).update({ id: playerId }, { status: 'removed', removedAt: new Date(), tokenVersion });
  }

  async setPlayerStatus(playerId: string, status: LivePlayer['status']): Promise<void> {
    await this.db.getRepository(SessionPlayerEntity).update({ id: playerId, status: Not('removed') }, { status });
  }

  /** The session's teams become exactly `teams` (players' team ids are written by savePlayers). */
  async replaceTeams(m: EntityManager, sessionId: string, teams: LiveTeam[]): Promise<void> {
    const repo = m.getRepository(SessionTeamEntity);
    await repo.delete({ sessionId, ...(teams.length ? { id: Not(In(teams.map((t) => t.id))) } : {}) });
    // Positions are unique per session: park the kept rows out of the way first.
    await m.query('UPDATE session_teams SET position = position + 100000 WHERE session_id = $1', [sessionId]);
    await repo.save(teams.map((t) => repo.create({ ...t, sessionId })));
  }

  async loadLive(): Promise<LoadedSession[]> {
    const rows = await this.db.getRepository(SessionEntity).find({ where: { status: Not('ended') }, order: { createdAt: 'ASC' } });
    const out: LoadedSession[] = [];
    for (const row of rows) out.push(await this.loadOne(row));
    return out;
  }

  private async loadOne(row: SessionEntity): Promise<LoadedSession> {
    const [cls, players, teams, pending] = await Promise.all([
      row.classId ? this.db.getRepository(ClassEntity).findOne({ where: { id: row.classId } }) : Promise.resolve(null),
      this.db.getRepository(SessionPlayerEntity).find({ where: { sessionId: row.id }, order: { createdAt: 'ASC', id: 'ASC' } }),
      this.db.getRepository(SessionTeamEntity).find({ where: { sessionId: row.id }, order: { position: 'ASC' } }),
      this.db.query(
        `SELECT seq, player_id, round_index, client_message_id, kind, response, locked, received_at
         FROM responses WHERE session_id = $1 AND seq > $2 ORDER BY seq`,
        [row.id, row.snapshotSeq],
      ) as Promise<{ seq: string; player_id: string; round_index: number; client_message_id: string; kind: ResponseKind; response: ItemResponse | null; locked: boolean; received_at: Date }[]>,
    ]);
    return {
      row,
      className: cls ? classLabel(cls) : null,
      players,
      teams,
      pending: pending.map((r) => ({
        seq: Number(r.seq),
        playerId: r.player_id,
        roundIndex: r.round_index,
        clientMessageId: r.client_message_id,
        kind: r.kind,
        response: r.response,
        locked: r.locked,
        receivedAt: r.received_at.getTime(),
      })),
    };
  }

  /** Pair rules, the class's recent teams and prior accuracy, in terms of this session's player ids. */
  async mixerContext(classId: string | null, sessionId: string, players: LivePlayer[]): Promise<MixerContext> {
    const empty: MixerContext = { keepApart: [], keepTogether: [], history: [], priors: new Map() };
    if (!classId) return empty;
    const byEntry = new Map(players.filter((p) => p.rosterEntryId).map((p) => [p.rosterEntryId as string, p.id]));
    if (byEntry.size === 0) return empty;
    const entryIds = [...byEntry.keys()];
    const rules = await this.db.getRepository(PairRuleEntity).find({ where: { classId } });
    const pairs = (kind: string): [string, string][] =>
      rules
        .filter((r) => r.kind === kind && byEntry.has(r.entryAId) && byEntry.has(r.entryBId))
        .map((r) => [byEntry.get(r.entryAId) as string, byEntry.get(r.entryBId) as string]);

    const past: { id: string }[] = await this.db.query(
      `SELECT id FROM sessions WHERE class_id = $1 AND status = 'ended' AND id <> $2 ORDER BY ended_at DESC NULLS LAST LIMIT $3`,
      [classId, sessionId, HISTORY_SESSIONS],
    );
    const history: PairingHistory[] = [];
    if (past.length) {
      const members: { session_id: string; team_id: string; roster_entry_id: string }[] = await this.db.query(
        `SELECT session_id, team_id, roster_entry_id FROM session_players
         WHERE session_id = ANY($1) AND team_id IS NOT NULL AND roster_entry_id = ANY($2)`,
        [past.map((p) => p.id), entryIds],
      );
      past.forEach((p, i) => {
        const teams = new Map<string, string[]>();
        for (const m of members.filter((x) => x.session_id === p.id)) {
          const list = teams.get(m.team_id) ?? [];
          list.push(byEntry.get(m.roster_entry_id) as string);
          teams.set(m.team_id, list);
        }
        history.push({ sessionsAgo: i + 1, teams: [...teams.values()].filter((t) => t.length > 1) });
      });
    }
    const priorRows: { roster_entry_id: string; p: number }[] = await this.db.query(
      `SELECT sp.roster_entry_id, AVG(r.credit)::float8 AS p FROM responses r
       JOIN session_players sp ON sp.id = r.player_id JOIN sessions s ON s.id = r.session_id
       WHERE s.class_id = $1 AND s.status = 'ended' AND r.final AND r.credit IS NOT NULL AND sp.roster_entry_id = ANY($2)
       GROUP BY sp.roster_entry_id`,
      [classId, entryIds],
    );
    return {
      keepApart: pairs('apart'),
      keepTogether: pairs('together'),
      history,
      priors: new Map(priorRows.map((r) => [byEntry.get(r.roster_entry_id) as string, r.p])),
    };
  }
}
