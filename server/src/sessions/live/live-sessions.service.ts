import { Inject, Injectable, Logger, OnApplicationBootstrap, OnModuleDestroy } from '@nestjs/common';
import {
  TEAM_COLOURS,
  TEAM_PATTERNS,
  type HostCommand,
  type HostSessionView,
  type ItemResponse,
  type PlayerSessionView,
  type SubmitAnswerPayload,
} from '@covalent/shared-types';
import { randomBytes, randomUUID } from 'node:crypto';
import { QueryFailedError } from 'typeorm';
import { createRng, describeCost, formTeams, placeLateJoiner, teamNamePack, type MixerPlayer } from '../../mixer/domain';
import { activeElapsed, type EngineEvent, type EngineResult, type SessionState } from '../domain';
import { SessionPlayerEntity } from '../entities/session-player.entity';
import type { SessionEntity } from '../entities/session.entity';
import { checkNickname } from '../nickname';
import { SESSION_CLOCK, SESSION_TUNING, type SessionClock, type SessionTuning } from '../sessions.constants';
import { LiveSession, type LivePlayer, type LiveSessionMeta, type LiveTeam } from './live-session';
import { parseResponse } from './payloads';
import { decodeSnapshot } from './snapshot-codec';
import { SessionEmitter } from './session-emitter.service';
import { SessionStore, type LoadedSession } from './session-store.service';
import { hostView, itemView, playerReveal, playerView, standingRows, timing } from './session-views';

/** What a failed operation answers: the ack's error shape. */
export interface Fail {
  ok: false;
  error: string;
  message: string;
}
type Done = { ok: true; events: EngineEvent[] } | Fail;

const fail = (error: string, message: string): Fail => ({ ok: false, error, message });
const STORAGE_FAIL = fail('storage_unavailable', 'The server could not save that just now. Try again in a moment.');
/** Host screens get at most one full view per session this often (ms); commands still ack with the view at once. */
const HOST_PUSH_MS = 100;

export interface JoinInput {
  nickname: string;
  nicknameKey: string;
  rosterEntryId: string | null;
  tableGroup: string | null;
  timeMultiplier: number;
}

export type SubmitAck = { ok: true; duplicate: boolean; locked: boolean; acceptedAt: number } | Fail;

function uniqueViolation(err: unknown): string | null {
  if (!(err instanceof QueryFailedError)) return null;
  const e = err.driverError as { code?: string; constraint?: string };
  return e?.code === '23505' ? (e.constraint ?? 'unique') : null;
}

export function metaFromRow(row: SessionEntity, className: string | null): LiveSessionMeta {
  return {
    id: row.id,
    ownerId: row.ownerId,
    schoolId: row.schoolId,
    classId: row.classId,
    className,
    bankId: row.bankId,
    bankTitle: row.bankTitle,
    joinCode: row.joinCode,
    format: row.format,
    settings: row.settings,
    items: row.items,
    seed: row.seed,
    mixerSeed: row.mixerSeed,
    mixerSummary: row.mixerSummary,
    joiningLocked: row.joiningLocked,
    createdAt: row.createdAt,
    startedAt: row.startedAt,
    endedAt: row.endedAt,
  };
}

/**
 * The live runtime: one SessionEngine per live session, its timers, its
 * persistence and its broadcasts. Every change to a session runs in that
 * session's queue: engine first, then the database, then the sockets.
 */
@Injectable()
export class LiveSessionsService implements OnApplicationBootstrap, OnModuleDestroy {
  private readonly logger = new Logger('LiveSessions');
  private readonly live = new Map<string, LiveSession>();
  private readonly byCode = new Map<string, string>();
  private readonly hostDirty = new Set<string>();
  private hostFlush: NodeJS.Timeout | null = null;
  private snapshotTimer: NodeJS.Timeout | null = null;
  private readonly retention = new Set<NodeJS.Timeout>();
  private shuttingDown = false;

  constructor(
    private readonly store: SessionStore,
    private readonly emitter: SessionEmitter,
    @Inject(SESSION_CLOCK) private readonly clock: SessionClock,
    @Inject(SESSION_TUNING) private readonly tuning: SessionTuning,
  ) {}

  // ---- lifecycle -------------------------------------------------------------

  async onApplicationBootstrap(): Promise<void> {
    for (const loaded of await this.store.loadLive()) {
      try {
        await this.restore(loaded);
      } catch (err) {
        this.logger.error(`could not restore session ${loaded.row.id}: ${(err as Error).stack ?? String(err)}`);
      }
    }
    this.snapshotTimer = setInterval(() => this.snapshotDirty(), this.tuning.snapshotEveryMs);
    this.snapshotTimer.unref();
  }

  /**
   * Stops timers and lets queued work finish; live sessions stay live in the
   * database. No final snapshot on purpose: a clean stop leaves what a crash
   * leaves, so the next start always takes the one restore path (snapshot + replay).
   */
  async onModuleDestroy(): Promise<void> {
    this.shuttingDown = true;
    if (this.snapshotTimer) clearInterval(this.snapshotTimer);
    if (this.hostFlush) clearTimeout(this.hostFlush);
    for (const t of this.retention) clearTimeout(t);
    for (const s of this.live.values()) {
      if (s.timer) clearTimeout(s.timer);
      for (const t of s.awayTimers.values()) clearTimeout(t);
    }
    await Promise.all([...this.live.values()].map((s) => s.queue.idle()));
  }

  get(sessionId: string): LiveSession | undefined {
    return this.live.get(sessionId);
  }

  byJoinCode(code: string): LiveSession | undefined {
    const id = this.byCode.get(code);
    return id ? this.live.get(id) : undefined;
  }

  /** A new session, before its row is stored: the engine it starts with gives the first snapshot. */
  prepare(meta: LiveSessionMeta): LiveSession {
    return new LiveSession(meta, this.clock, null);
  }

  /** Takes a prepared session live once its row is stored. */
  adopt(s: LiveSession): void {
    this.add(s);
  }

  private add(s: LiveSession): void {
    this.live.set(s.id, s);
    if (s.engine.status !== 'ended') this.byCode.set(s.meta.joinCode, s.id);
  }

  /**
   * Rebuild after a restart: the stored snapshot, then every response stored
   * after it, replayed at its own receipt time so each acknowledged answer counts
   * exactly as it did; then the timers again.
   */
  private async restore(loaded: LoadedSession): Promise<void> {
    const { row } = loaded;
    const s = new LiveSession(metaFromRow(row, loaded.className), this.clock, decodeSnapshot(row.snapshot));
    s.lastSeq = Number(row.snapshotSeq);
    for (const t of loaded.teams) s.teams.push({ id: t.id, position: t.position, name: t.name, colour: t.colour, pattern: t.pattern });
    for (const p of loaded.players) {
      s.players.set(p.id, {
        id: p.id,
        nickname: p.nickname,
        rosterEntryId: p.rosterEntryId,
        tableGroup: p.tableGroup,
        timeMultiplier: p.timeMultiplier,
        teamId: p.teamId,
        number: p.number,
        status: p.status === 'removed' ? 'removed' : 'away',
        tokenVersion: p.tokenVersion,
      });
    }
    const snapshot = s.engine.toSnapshot();
    for (const round of snapshot.rounds) {
      if (round.status === 'revealed' && round.results) {
        s.revealed.set(round.index, round.results);
        s.resultsStored.add(round.index);
      }
    }
    for (const r of loaded.pending) {
      s.clock.pin(r.receivedAt);
      const result =
        r.kind === 'answer'
          ? s.engine.submit({ playerId: r.playerId, clientMessageId: r.clientMessageId, response: r.response, at: r.receivedAt, lock: r.locked })
          : s.engine.lockIn({ playerId: r.playerId, at: r.receivedAt });
      if (!result.ok && r.kind === 'answer') {
        this.logger.warn(`session ${s.id}: stored answer ${r.seq} could not be replayed (${result.error})`);
      }
      s.lastSeq = Math.max(s.lastSeq, r.seq);
      s.unsnapshotted++;
    }
    s.clock.pin(null);
    const ticked = s.engine.tick();
    this.add(s);
    if (s.unsnapshotted > 0 || (ticked.ok && ticked.events.length > 0)) await this.persist(s);
    this.arm(s);
    // Nobody is connected after a restart; whoever has not come back by then counts as away.
    const grace = setTimeout(() => {
      this.retention.delete(grace);
      for (const p of s.activePlayers()) if (!s.sockets.get(p.id)) void this.setAway(s, p.id);
    }, this.tuning.restoreGraceMs);
    grace.unref();
    this.retention.add(grace);
    this.logger.log(`restored session ${s.id} (${s.engine.status}, ${loaded.pending.length} responses replayed)`);
  }

  // ---- persistence -----------------------------------------------------------

  /** Snapshot + session row + rounds (+ results due), in one transaction. */
  private async persist(s: LiveSession, extra?: (m: import('typeorm').EntityManager) => Promise<void>): Promise<void> {
    const seq = s.lastSeq;
    const stored = await this.store.transaction(async (m) => {
      if (extra) await extra(m);
      return this.store.saveState(s, m);
    });
    for (const index of stored) s.resultsStored.add(index);
    if (s.lastSeq === seq) s.unsnapshotted = 0;
  }

  private snapshotDirty(): void {
    for (const s of this.live.values()) {
      if (s.unsnapshotted === 0 || this.shuttingDown) continue;
      void s.queue.run(() => this.persist(s)).catch((err) => this.logger.warn(`snapshot of ${s.id} failed: ${String(err)}`));
    }
  }

  /** Applies an engine change and stores it; if the database refuses, the engine goes back to `before`. */
  private async commit(s: LiveSession, before: SessionState, undo: () => void, extra?: (m: import('typeorm').EntityManager) => Promise<void>): Promise<Fail | null> {
    try {
      await this.persist(s, extra);
      return null;
    } catch (err) {
      this.logger.error(`session ${s.id}: could not store a change: ${String(err)}`);
      s.rollback(before);
      undo();
      return STORAGE_FAIL;
    }
  }

  // ---- timers ----------------------------------------------------------------

  private arm(s: LiveSession): void {
    if (s.timer) clearTimeout(s.timer);
    s.timer = null;
    if (this.shuttingDown) return;
    const at = s.engine.nextDeadline();
    if (at === null) return;
    // A few ms late on purpose: the engine closes at or after the deadline, never before.
    const delay = Math.min(Math.max(0, at - this.clock.now()) + 5, 2 ** 31 - 1);
    s.timer = setTimeout(() => {
      s.timer = null;
      void s.queue.run(() => this.tick(s)).catch((err) => this.logger.error(`tick of ${s.id} failed: ${String(err)}`));
    }, delay);
  }

  private async tick(s: LiveSession): Promise<void> {
    if (this.shuttingDown) return;
    const result = s.engine.tick();
    if (result.ok && result.events.length) {
      await this.persist(s).catch((err) => this.logger.warn(`snapshot after close of ${s.id} failed: ${String(err)}`));
      this.after(s, result.events);
    } else {
      this.arm(s);
    }
  }

  // ---- joining ---------------------------------------------------------------

  /** Adds a player (placed on a team once teams exist; in the engine once started). */
  join(s: LiveSession, input: JoinInput): Promise<LivePlayer | Fail> {
    return s.queue.run(async () => {
      if (s.engine.status === 'ended') return fail('session_ended', 'This session has ended.');
      if (s.meta.joiningLocked) return fail('joining_locked', 'The teacher has closed joining for this session.');
      const active = s.activePlayers();
      if (input.rosterEntryId && active.some((p) => p.rosterEntryId === input.rosterEntryId)) {
        return fail('roster_entry_taken', 'Someone has already joined with that name. Ask your teacher.');
      }
      const before = s.engine.toSnapshot();
      let player: LivePlayer | null = null;
      let events: EngineEvent[] = [];
      try {
        await this.store.transaction(async (m) => {
          const row = await this.store.insertPlayer(m, {
            sessionId: s.id,
            nickname: input.nickname,
            nicknameKey: input.nicknameKey,
            rosterEntryId: input.rosterEntryId,
            tableGroup: input.tableGroup,
            timeMultiplier: input.timeMultiplier,
          });
          const p: LivePlayer = { ...input, id: row.id, teamId: null, number: null, status: 'connected', tokenVersion: row.tokenVersion };
          if (s.teams.length) p.teamId = this.placeNewcomer(s, p);
          if (s.started && p.teamId) {
            const added = s.engine.addPlayer({ id: p.id, teamId: p.teamId, timeMultiplier: p.timeMultiplier });
            if (!added.ok) throw new Error(`engine refused a late joiner: ${added.message}`);
            p.number = added.player.number;
            events = added.events;
            // Joining is not being here yet: away until their socket connects.
            const away = s.engine.markAway(p.id);
            if (away.ok) events.push(...away.events);
          }
          if (!s.started && p.teamId) p.number = s.membersOf(p.teamId).length + 1;
          p.status = 'away';
          await m.getRepository(SessionPlayerEntity).update({ id: p.id }, { teamId: p.teamId, number: p.number, status: 'away' });
          player = p;
          s.players.set(p.id, p);
          if (s.started) await this.store.saveState(s, m);
        });
      } catch (err) {
        if (player) s.players.delete((player as LivePlayer).id);
        s.rollback(before);
        const constraint = uniqueViolation(err);
        if (constraint?.includes('roster_entry')) return fail('roster_entry_taken', 'Someone has already joined with that name. Ask your teacher.');
        if (constraint?.includes('nickname')) return fail('nickname_taken', 'Someone in this session already has that nickname. Choose another.');
        this.logger.error(`join to ${s.id} failed: ${String(err)}`);
        return STORAGE_FAIL;
      }
      const joined = player as unknown as LivePlayer;
      this.after(s, events);
      if (joined.teamId) this.stateToTeam(s, joined.teamId);
      return joined;
    });
  }

  /** Late joiners (and lobby joiners once teams exist) go to the smallest team, then the one with fewest table-mates. */
  private placeNewcomer(s: LiveSession, p: LivePlayer): string {
    const toMixer = (x: LivePlayer): MixerPlayer => ({ id: x.id, tableGroup: x.tableGroup, priorScore: null });
    const byId = new Map(s.activePlayers().map((x) => [x.id, toMixer(x)]));
    const members = s.teams.map((t) => s.membersOf(t.id).map((x) => x.id));
    return s.teams[placeLateJoiner(members, toMixer(p), byId)].id;
  }

  // ---- connections -----------------------------------------------------------

  /** A player socket connected: back from away, and their full view. */
  connectPlayer(s: LiveSession, playerId: string): Promise<PlayerSessionView> {
    s.sockets.set(playerId, (s.sockets.get(playerId) ?? 0) + 1);
    const pending = s.awayTimers.get(playerId);
    if (pending) clearTimeout(pending);
    s.awayTimers.delete(playerId);
    return s.queue.run(async () => {
      if (s.statusOf(playerId) === 'away') await this.setStatus(s, playerId, 'connected');
      return playerView(s, playerId);
    });
  }

  disconnectPlayer(s: LiveSession, playerId: string): void {
    if (this.shuttingDown) return;
    const left = Math.max(0, (s.sockets.get(playerId) ?? 1) - 1);
    s.sockets.set(playerId, left);
    if (left > 0 || s.awayTimers.has(playerId)) return;
    const timer = setTimeout(() => {
      s.awayTimers.delete(playerId);
      if (!s.sockets.get(playerId)) void this.setAway(s, playerId);
    }, this.tuning.awayGraceMs);
    s.awayTimers.set(playerId, timer);
  }

  private setAway(s: LiveSession, playerId: string): Promise<void> {
    return s.queue.run(async () => {
      if (!this.shuttingDown && !s.sockets.get(playerId) && s.statusOf(playerId) === 'connected') await this.setStatus(s, playerId, 'away');
    });
  }

  /** Inside the queue. A status change is stored with the snapshot: it can pass a numbered call on. */
  private async setStatus(s: LiveSession, playerId: string, status: 'connected' | 'away'): Promise<void> {
    const p = s.players.get(playerId);
    if (!p) return;
    p.status = status;
    let events: EngineEvent[] = [];
    if (s.started) {
      const r = status === 'away' ? s.engine.markAway(playerId) : s.engine.markBack(playerId);
      if (r.ok) events = r.events;
    }
    try {
      await this.store.setPlayerStatus(playerId, status);
      if (s.started) await this.persist(s);
    } catch (err) {
      this.logger.warn(`session ${s.id}: status of ${playerId} not stored: ${String(err)}`);
    }
    this.after(s, events);
  }

  // ---- host commands ---------------------------------------------------------

  hostCommand(s: LiveSession, command: HostCommand): Promise<{ ok: true; view: HostSessionView } | Fail> {
    return s.queue.run(async () => {
      const done = await this.apply(s, command);
      if (!done.ok) return done;
      this.after(s, done.events);
      return { ok: true as const, view: hostView(s) };
    });
  }

  private async apply(s: LiveSession, command: HostCommand): Promise<Done> {
    const e = s.engine;
    switch (command.type) {
      case 'start':
        return this.start(s);
      case 'reshuffle':
        return this.reshuffle(s);
      case 'lock_joining':
        return this.lockJoining(s, command.locked);
      case 'remove_player':
        return this.removePlayer(s, command.playerId);
      case 'rename_player':
        return this.renamePlayer(s, command.playerId, command.nickname);
      case 'open_round':
        return this.engineStep(s, () => e.openRound());
      case 'pause':
        return this.engineStep(s, () => e.pause());
      case 'resume':
        return this.engineStep(s, () => e.resume());
      case 'add_time':
        return this.engineStep(s, () => e.addTime());
      case 'close_round':
        return this.engineStep(s, () => e.closeRound());
      case 'reveal':
        return this.engineStep(s, () => e.reveal());
      case 'next':
        return this.engineStep(s, () => e.next());
      case 'end':
        return this.end(s);
    }
  }

  private async engineStep(s: LiveSession, step: () => EngineResult): Promise<Done> {
    const before = s.engine.toSnapshot();
    const result = step();
    if (!result.ok) return result;
    const failed = await this.commit(s, before, () => undefined);
    return failed ?? { ok: true, events: result.events };
  }

  private async end(s: LiveSession): Promise<Done> {
    const before = s.engine.toSnapshot();
    const result = s.engine.end();
    if (!result.ok) return result;
    const endedAt = s.meta.endedAt;
    s.meta.endedAt = new Date(this.clock.now());
    const failed = await this.commit(s, before, () => (s.meta.endedAt = endedAt));
    if (failed) return failed;
    this.byCode.delete(s.meta.joinCode);
    for (const t of s.awayTimers.values()) clearTimeout(t);
    s.awayTimers.clear();
    const forget = setTimeout(() => {
      this.retention.delete(forget);
      if (this.live.get(s.id) === s) this.live.delete(s.id);
      this.emitter.disconnectSession(s.id);
    }, this.tuning.endedRetentionMs);
    forget.unref();
    this.retention.add(forget);
    return { ok: true, events: result.events };
  }

  /** Teams for the players present: roster tables, pair rules, the class's recent teams, the session's mode and sizes. */
  private async planTeams(s: LiveSession, seed: string): Promise<{ teams: LiveTeam[]; assignment: Map<string, string>; summary: LiveSessionMeta['mixerSummary'] }> {
    const players = s.activePlayers();
    const ctx = await this.store.mixerContext(s.meta.classId, s.id, players);
    const { settings } = s.meta;
    const result = formTeams({
      players: players.map((p) => ({ id: p.id, tableGroup: p.tableGroup, priorScore: ctx.priors.get(p.id) ?? null })),
      teamCount: settings.teamCount ?? undefined,
      targetSize: settings.teamCount ? undefined : (settings.targetTeamSize ?? undefined),
      keepApart: ctx.keepApart,
      keepTogether: ctx.keepTogether,
      history: ctx.history,
      mode: settings.mixerMode,
      seed,
    });
    const names = teamNamePack(settings.namePack, result.teams.length, createRng(`${seed}:names`));
    const teams: LiveTeam[] = result.teams.map((_, i) => ({
      id: s.teams[i]?.id ?? randomUUID(),
      position: i,
      name: names[i],
      colour: TEAM_COLOURS[i % TEAM_COLOURS.length],
      pattern: TEAM_PATTERNS[i % TEAM_PATTERNS.length],
    }));
    const assignment = new Map<string, string>();
    result.teams.forEach((ids, i) => ids.forEach((id) => assignment.set(id, teams[i].id)));
    return {
      teams,
      assignment,
      summary: {
        mode: settings.mixerMode,
        seed,
        description: describeCost(result.cost),
        sameTablePairs: result.cost.sameTablePairs,
        repeatPairs: result.cost.repeatPairs,
        keepApartViolations: result.cost.keepApartViolations,
      },
    };
  }

  /** The lobby teams stand when every present player is on one and no team is empty. */
  private lobbyTeamsHold(s: LiveSession): boolean {
    const active = s.activePlayers();
    return s.teams.length > 0 && active.every((p) => s.teams.some((t) => t.id === p.teamId)) && s.teams.every((t) => s.membersOf(t.id).length > 0);
  }

  /** Writes a team plan (lobby or start): teams, every player's team and number, and the snapshot, atomically. */
  private async applyPlan(
    s: LiveSession,
    plan: { teams: LiveTeam[]; assignment: Map<string, string> },
    before: SessionState,
    engineSide: (players: LivePlayer[]) => EngineEvent[] | Fail,
  ): Promise<Done> {
    const oldTeams = new Map([...s.players.values()].map((p) => [p.id, p.teamId]));
    const players = s.activePlayers().map((p) => ({ ...p, teamId: plan.assignment.get(p.id) ?? null, number: null as number | null }));
    for (const team of plan.teams) {
      players.filter((p) => p.teamId === team.id).forEach((p, i) => (p.number = i + 1));
    }
    const events = engineSide(players);
    if ('ok' in events) {
      s.rollback(before);
      return events;
    }
    const prevTeams = s.teams;
    const prevPlayers = new Map(s.players);
    s.teams = plan.teams;
    for (const p of players) s.players.set(p.id, p);
    const failed = await this.commit(
      s,
      before,
      () => {
        s.teams = prevTeams;
        s.players = prevPlayers;
      },
      async (m) => {
        await this.store.replaceTeams(m, s.id, plan.teams);
        await this.store.savePlayers(m, s, players);
      },
    );
    if (failed) return failed;
    for (const p of players) this.emitter.moveToTeam(p.id, oldTeams.get(p.id) ?? null, p.teamId);
    return { ok: true, events };
  }

  private async start(s: LiveSession): Promise<Done> {
    if (s.engine.status !== 'lobby') return fail('not_in_lobby', 'The session has already started.');
    if (s.activePlayers().length === 0) return fail('no_players', 'Wait for at least one player to join before starting.');
    const before = s.engine.toSnapshot();
    const prevMeta = { ...s.meta };
    let plan: { teams: LiveTeam[]; assignment: Map<string, string> };
    if (this.lobbyTeamsHold(s)) {
      plan = { teams: s.teams, assignment: new Map(s.activePlayers().map((p) => [p.id, p.teamId as string])) };
    } else {
      const seed = s.meta.mixerSeed ?? randomBytes(8).toString('hex');
      const formed = await this.planTeams(s, seed);
      plan = formed;
      s.meta.mixerSeed = seed;
      s.meta.mixerSummary = formed.summary;
    }
    s.meta.startedAt = new Date(this.clock.now());
    const done = await this.applyPlan(s, plan, before, (players) => {
      const events: EngineEvent[] = [];
      for (const t of plan.teams) {
        const r = s.engine.addTeam({ id: t.id, name: t.name });
        if (!r.ok) return r;
      }
      for (const p of players) {
        if (!p.teamId) continue;
        const r = s.engine.addPlayer({ id: p.id, teamId: p.teamId, timeMultiplier: p.timeMultiplier, number: p.number ?? undefined });
        if (!r.ok) return r;
        if (s.players.get(p.id)?.status === 'away') s.engine.markAway(p.id);
      }
      const started = s.engine.start();
      if (!started.ok) return started;
      events.push(...started.events);
      return events;
    });
    if (!done.ok) s.meta = prevMeta;
    return done;
  }

  private async reshuffle(s: LiveSession): Promise<Done> {
    if (s.engine.status !== 'lobby') return fail('not_in_lobby', 'Teams can be reshuffled only in the lobby.');
    if (s.activePlayers().length === 0) return fail('no_players', 'Nobody has joined yet.');
    const before = s.engine.toSnapshot();
    const prevMeta = { ...s.meta };
    const seed = randomBytes(8).toString('hex');
    const plan = await this.planTeams(s, seed);
    s.meta.mixerSeed = seed;
    s.meta.mixerSummary = plan.summary;
    const done = await this.applyPlan(s, plan, before, () => []);
    if (!done.ok) s.meta = prevMeta;
    else for (const p of s.activePlayers()) this.emitter.toPlayer(p.id, 'session:state', playerView(s, p.id));
    return done;
  }

  private async lockJoining(s: LiveSession, locked: boolean): Promise<Done> {
    if (s.engine.status === 'ended') return fail('session_ended', 'The session has ended.');
    const before = s.engine.toSnapshot();
    const prev = s.meta.joiningLocked;
    s.meta.joiningLocked = locked;
    const failed = await this.commit(s, before, () => (s.meta.joiningLocked = prev));
    return failed ?? { ok: true, events: [] };
  }

  private async removePlayer(s: LiveSession, playerId: string): Promise<Done> {
    const p = s.players.get(playerId);
    if (!p || s.statusOf(playerId) === 'removed') return fail('unknown_player', 'No such player in this session.');
    if (s.engine.status === 'ended') return fail('session_ended', 'The session has ended.');
    const before = s.engine.toSnapshot();
    let events: EngineEvent[] = [];
    if (s.started) {
      const r = s.engine.removePlayer(playerId);
      if (!r.ok) return r;
      events = r.events;
    }
    const prev = { ...p };
    p.status = 'removed';
    p.tokenVersion += 1;
    const failed = await this.commit(s, before, () => Object.assign(p, prev), (m) => this.store.removePlayer(m, playerId, p.tokenVersion));
    if (failed) return failed;
    this.emitter.toPlayer(playerId, 'player:removed', { message: 'The teacher removed you from this session.' });
    this.emitter.disconnectPlayer(playerId);
    if (p.teamId) this.stateToTeam(s, p.teamId);
    return { ok: true, events };
  }

  private async renamePlayer(s: LiveSession, playerId: string, nickname: string): Promise<Done> {
    const p = s.players.get(playerId);
    if (!p || s.statusOf(playerId) === 'removed') return fail('unknown_player', 'No such player in this session.');
    const checked = checkNickname(nickname);
    if (!checked.ok) return checked;
    const before = s.engine.toSnapshot();
    const prev = p.nickname;
    p.nickname = checked.nickname;
    try {
      await this.store.transaction(async (m) => {
        await m.query('UPDATE session_players SET nickname = $2, nickname_key = $3, updated_at = now() WHERE id = $1', [playerId, checked.nickname, checked.key]);
      });
    } catch (err) {
      p.nickname = prev;
      s.rollback(before);
      if (uniqueViolation(err)) return fail('nickname_taken', 'Someone in this session already has that nickname.');
      return STORAGE_FAIL;
    }
    if (p.teamId) this.stateToTeam(s, p.teamId);
    else this.emitter.toPlayer(playerId, 'session:state', playerView(s, playerId));
    return { ok: true, events: [] };
  }

  // ---- answers ---------------------------------------------------------------

  /** Acknowledged only once the row is committed; a resend returns the first acceptance. */
  submit(s: LiveSession, playerId: string, payload: Omit<SubmitAnswerPayload, 'response'> & { response: unknown }): Promise<SubmitAck> {
    return s.queue.run(async (): Promise<SubmitAck> => {
      const round = s.engine.peekRound();
      if (!round || payload.roundIndex !== round.index) {
        const earlier = await this.store.findResponse(playerId, payload.clientMessageId);
        if (earlier) return { ok: true, duplicate: true, locked: earlier.locked, acceptedAt: earlier.receivedAt };
        return round && payload.roundIndex < round.index ? fail('too_late', 'That round is over.') : fail('round_not_open', 'That round is not open.');
      }
      const item = s.meta.items[round.index];
      const response = parseResponse(payload.response, item);
      if (!response.ok) return response;
      const player = s.players.get(playerId);
      const before = s.engine.checkpoint();
      const at = this.clock.now();
      const result = s.engine.submit({ playerId, clientMessageId: payload.clientMessageId, response: response.value, at, lock: payload.lock });
      if (!result.ok) {
        // Closed by the timer a moment ago: to the student that is "time was up", not "not open".
        if (result.error === 'round_not_open' && (round.status === 'closed' || round.status === 'revealed')) {
          return fail('too_late', 'Time was up for this round.');
        }
        return result;
      }
      const { acceptance } = result;
      if (result.duplicate) return { ok: true, duplicate: true, locked: acceptance.locked, acceptedAt: acceptance.acceptedAt };
      try {
        const stored = await this.store.insertResponse({
          sessionId: s.id,
          roundIndex: round.index,
          playerId,
          teamId: player?.teamId ?? null,
          clientMessageId: payload.clientMessageId,
          kind: 'answer',
          response: response.value,
          locked: acceptance.locked,
          elapsedMs: activeElapsed(round, at, at),
          receivedAt: at,
        });
        if (!stored) {
          // The database already has it (the memory did not): count the stored one, not this.
          s.rollback(before);
          const earlier = await this.store.findResponse(playerId, payload.clientMessageId);
          return { ok: true, duplicate: true, locked: earlier?.locked ?? acceptance.locked, acceptedAt: earlier?.receivedAt ?? at };
        }
        s.lastSeq = Math.max(s.lastSeq, stored.seq);
        s.unsnapshotted++;
      } catch (err) {
        this.logger.error(`session ${s.id}: answer not stored: ${String(err)}`);
        s.rollback(before);
        return STORAGE_FAIL;
      }
      await this.afterAnswer(s, result.events);
      return { ok: true, duplicate: false, locked: acceptance.locked, acceptedAt: acceptance.acceptedAt };
    });
  }

  /** huddle: lock the current vote in. Stored as its own row so a restart keeps it. */
  lock(s: LiveSession, playerId: string, roundIndex: number): Promise<{ ok: true } | Fail> {
    return s.queue.run(async () => {
      const round = s.engine.peekRound();
      if (!round || round.index !== roundIndex) return fail('round_not_open', 'That round is not open.');
      const before = s.engine.checkpoint();
      const at = this.clock.now();
      const result = s.engine.lockIn({ playerId, at });
      if (!result.ok) return result;
      try {
        const stored = await this.store.insertResponse({
          sessionId: s.id,
          roundIndex,
          playerId,
          teamId: s.players.get(playerId)?.teamId ?? null,
          clientMessageId: `lock:${randomUUID()}`,
          kind: 'lock',
          response: null,
          locked: true,
          elapsedMs: activeElapsed(round, at, at),
          receivedAt: at,
        });
        if (stored) s.lastSeq = Math.max(s.lastSeq, stored.seq);
        s.unsnapshotted++;
      } catch (err) {
        this.logger.error(`session ${s.id}: lock not stored: ${String(err)}`);
        s.rollback(before);
        return STORAGE_FAIL;
      }
      await this.afterAnswer(s, result.events);
      return { ok: true as const };
    });
  }

  /** An answer that closed the round (everyone locked in) also stores the snapshot, so the close survives a restart. */
  private async afterAnswer(s: LiveSession, events: EngineEvent[]): Promise<void> {
    if (events.some((e) => e.type === 'round_closed')) {
      await this.persist(s).catch((err) => this.logger.warn(`snapshot after close of ${s.id} failed: ${String(err)}`));
    }
    this.after(s, events);
  }

  // ---- views and broadcasts --------------------------------------------------

  playerView(s: LiveSession, playerId: string): PlayerSessionView {
    return playerView(s, playerId);
  }

  hostView(s: LiveSession): HostSessionView {
    return hostView(s);
  }

  serverNow(): number {
    return this.clock.now();
  }

  /** After a change: absorb reveals, translate events to the wire, refresh the host screens, re-arm the timer. */
  private after(s: LiveSession, events: EngineEvent[]): void {
    for (const e of events) if (e.type === 'round_revealed') s.revealed.set(e.roundIndex, e.results);
    this.arm(s);
    if (this.shuttingDown) return;
    try {
      this.broadcast(s, events);
    } catch (err) {
      this.logger.error(`broadcast for ${s.id} failed: ${String(err)}`);
    }
    this.markHostDirty(s);
  }

  private markHostDirty(s: LiveSession): void {
    this.hostDirty.add(s.id);
    if (this.hostFlush) return;
    // At most one full host view per session every HOST_PUSH_MS: a burst of answers is one refresh.
    this.hostFlush = setTimeout(() => {
      this.hostFlush = null;
      for (const id of this.hostDirty) {
        const live = this.live.get(id);
        if (live && !this.shuttingDown) this.emitter.toHosts(id, 'host:state', hostView(live));
      }
      this.hostDirty.clear();
    }, HOST_PUSH_MS);
  }

  private stateToTeam(s: LiveSession, teamId: string): void {
    for (const m of s.membersOf(teamId)) this.emitter.toPlayer(m.id, 'session:state', playerView(s, m.id));
  }

  /** Engine events → protocol events. Nothing about correctness goes out before `round:revealed`. */
  private broadcast(s: LiveSession, events: EngineEvent[]): void {
    const players = () => s.activePlayers();
    const timings = () => {
      const round = s.engine.peekRound();
      if (round) for (const p of players()) this.emitter.toPlayer(p.id, 'round:timing', timing(s, round, p.id));
    };
    for (const e of events) {
      switch (e.type) {
        case 'session_started':
          this.emitter.toSession(s.id, 'session:status', { status: 'running' });
          for (const p of players()) this.emitter.toPlayer(p.id, 'session:state', playerView(s, p.id));
          break;
        case 'session_paused':
        case 'session_resumed':
          this.emitter.toSession(s.id, 'session:status', { status: s.engine.status });
          timings();
          break;
        case 'session_ended':
          this.emitter.toSession(s.id, 'session:status', { status: 'ended' });
          for (const p of players()) this.emitter.toPlayer(p.id, 'session:state', playerView(s, p.id));
          break;
        case 'round_opened': {
          const round = s.engine.peekRound();
          if (!round) break;
          const item = itemView(s, round.index);
          for (const p of players()) {
            this.emitter.toPlayer(p.id, 'round:opened', {
              roundIndex: round.index,
              itemCount: s.meta.items.length,
              item,
              timing: timing(s, round, p.id),
              calledPlayerId: (p.teamId && round.calls.find((c) => c.teamId === p.teamId)?.playerId) || null,
            });
          }
          break;
        }
        case 'time_added':
          timings();
          break;
        case 'call_passed':
          this.emitter.toTeam(e.call.teamId, 'round:call', { roundIndex: e.roundIndex, calledPlayerId: e.call.playerId });
          break;
        case 'votes_changed':
          this.emitter.toTeam(e.teamId, 'round:votes', {
            roundIndex: e.roundIndex,
            teamId: e.teamId,
            votes: e.votes.map((v) => ({ playerId: v.playerId, response: v.response as ItemResponse, locked: v.locked })),
          });
          break;
        case 'round_closed':
          this.emitter.toSession(s.id, 'round:closed', { roundIndex: e.roundIndex });
          break;
        case 'round_revealed':
          for (const p of players()) this.emitter.toPlayer(p.id, 'round:revealed', playerReveal(s, e.roundIndex, e.results, p.id));
          break;
        case 'standings': {
          const rows = standingRows(e.entries);
          for (const t of s.teams) {
            const own = s.engine.teamStanding(t.id);
            this.emitter.toTeam(t.id, 'standings:update', { own: own ? { rank: own.rank, points: own.points, teamCount: own.teamCount } : null, standings: rows });
          }
          break;
        }
        default:
          // answer_accepted (the ack), progress and player_status (host:state), round_ready, team_standing, *_added.
          break;
      }
    }
  }
}
