import { canonicalJson } from './canonical-json';
import { drawCallCycle, resolveCall } from './call-order';
import { computeRoundResults } from './round-results';
import { classView, ownStanding, teamStandings } from './standings';
import { activeElapsed, deadlineOffset, unitDeadline, unitWindowMs } from './timing';
import {
  ADD_TIME_MS,
  DEFAULT_ROUND_LIMIT_MS,
  DEFAULT_SPEED_WEIGHT,
  DEFAULT_UNITY_BONUS,
  FORMATS,
  STANDINGS_VIEWS,
  TIME_MULTIPLIERS,
  type Acceptance,
  type AnswerRecord,
  type CloseReason,
  type EngineDeps,
  type EngineError,
  type EngineErrorCode,
  type EngineEvent,
  type EngineResult,
  type OwnStanding,
  type PlayerInput,
  type PlayerState,
  type RoundResults,
  type RoundState,
  type RoundUnit,
  type SessionConfig,
  type SessionConfigInput,
  type SessionState,
  type StandingEntry,
  type SubmitInput,
  type SubmitOk,
  type TeamCall,
  type TeamInput,
  type TimeMultiplier,
  type UnitDeadline,
  type VoteView,
} from './types';

const SESSION = { kind: 'session' } as const;

interface RoundView {
  membersByTeam: Map<string, string[]>;
  answeredPlayers: Set<string>;
  answeredTeams: Set<string>;
  lockedPlayers: Set<string>;
  callByTeam: Map<string, TeamCall>;
}
const HOST = { kind: 'host' } as const;

function fail(error: EngineErrorCode, message: string): EngineError {
  return { ok: false, error, message };
}

function ok<T extends object>(events: EngineEvent[], extra: T): { ok: true; events: EngineEvent[] } & T {
  return { ok: true, events, ...extra };
}

function acceptanceKey(playerId: string, clientMessageId: string): string {
  return `${playerId}\u0000${clientMessageId}`;
}

function isMultiplier(value: number): value is TimeMultiplier {
  return (TIME_MULTIPLIERS as readonly number[]).includes(value);
}

/** Fills defaults and checks ranges; an error message lists every problem. */
export function resolveConfig(input: SessionConfigInput): SessionConfig | EngineError {
  const config: SessionConfig = {
    format: input.format,
    items: input.items.map((i) => ({ id: i.id })),
    roundLimitMs: input.roundLimitMs ?? DEFAULT_ROUND_LIMIT_MS,
    speedWeight: input.speedWeight ?? DEFAULT_SPEED_WEIGHT,
    standings: input.standings ?? 'full',
    unityBonus: input.unityBonus ?? DEFAULT_UNITY_BONUS,
  };
  const problems: string[] = [];
  if (!FORMATS.includes(config.format)) problems.push(`format must be one of ${FORMATS.join(', ')}`);
  if (!STANDINGS_VIEWS.includes(config.standings)) problems.push(`standings must be one of ${STANDINGS_VIEWS.join(', ')}`);
  if (config.items.length === 0) problems.push('a session needs at least one item');
  if (!(config.roundLimitMs > 0) || !Number.isFinite(config.roundLimitMs)) problems.push('roundLimitMs must be positive');
  if (!(config.speedWeight >= 0 && config.speedWeight <= 1)) problems.push('speedWeight must be in [0, 1]');
  if (!(config.unityBonus >= 0 && config.unityBonus <= 1)) problems.push('unityBonus must be in [0, 1]');
  return problems.length ? fail('invalid_config', problems.join('; ')) : config;
}

export interface CreateSessionInput {
  config: SessionConfigInput;
  teams?: TeamInput[];
  players?: PlayerInput[];
}

export interface FromSnapshotOptions {
  /**
   * The rng passed in is freshly seeded from the session seed: draw and drop the
   * values the engine had already used (default). Set false when the caller
   * restored the rng's own state instead.
   */
  fastForwardRng?: boolean;
}

/**
 * The live round engine of one session (DESIGN.md §4). Commands return
 * `{ ok: true, events }` or `{ ok: false, error, message }`; they never throw
 * for what a host or a player does. State is plain JSON (see toSnapshot).
 */
export class SessionEngine {
  /** id → player; the objects are the ones inside `state`, so status changes show through. */
  private readonly playerIndex: Map<string, PlayerState>;

  private constructor(
    private state: SessionState,
    private readonly deps: EngineDeps,
  ) {
    this.playerIndex = new Map(state.players.map((p) => [p.id, p]));
  }

  static create(input: CreateSessionInput, deps: EngineDeps): EngineResult<{ engine: SessionEngine }> {
    const config = resolveConfig(input.config);
    if ('ok' in config) return config;
    const engine = new SessionEngine(
      {
        version: 1,
        config,
        status: 'lobby',
        startedAt: null,
        endedAt: null,
        pausedAt: null,
        teams: [],
        players: [],
        rounds: [],
        currentRound: -1,
        callQueue: [],
        rngDraws: 0,
        acceptances: {},
        voteSeq: 0,
      },
      deps,
    );
    for (const team of input.teams ?? []) {
      const added = engine.addTeam(team);
      if (!added.ok) return added;
    }
    for (const player of input.players ?? []) {
      const added = engine.addPlayer(player);
      if (!added.ok) return added;
    }
    return ok([], { engine });
  }

  /** Rebuild after a restart; `deps.check` must be the same pure checker. */
  static fromSnapshot(snapshot: SessionState, deps: EngineDeps, options: FromSnapshotOptions = {}): SessionEngine {
    if (snapshot.version !== 1) throw new Error(`unsupported session snapshot version ${String(snapshot.version)}`);
    if (options.fastForwardRng ?? true) {
      for (let i = 0; i < snapshot.rngDraws; i++) deps.rng();
    }
    return new SessionEngine(structuredClone(snapshot), deps);
  }

  /** A deep copy of the whole state, safe to JSON.stringify and store. */
  toSnapshot(): SessionState {
    return structuredClone(this.state);
  }

  /**
   * A state to roll back to after one `submit` or `lockIn` that could not be stored. Cheaper than
   * `toSnapshot` on the hot path: those commands change only the current round, the players and
   * the answer bookkeeping, so earlier rounds are shared rather than copied. Pass it to
   * `fromSnapshot` (which deep-copies it) right away; do not keep it.
   */
  checkpoint(): SessionState {
    const s = this.state;
    return {
      ...s,
      teams: s.teams.map((t) => ({ ...t })),
      players: s.players.map((p) => ({ ...p })),
      // Of the current round, submit and lockIn change the scalars, answers (pushed or edited field
      // by field), the vote log (pushed) and, when they close the round, open pauses; roster, units
      // and calls stay as they are. Copying just those is several times cheaper than a deep clone.
      rounds: s.rounds.map((r, i) =>
        i === s.currentRound
          ? { ...r, pauses: r.pauses.map((p) => ({ ...p })), answers: r.answers.map((a) => ({ ...a })), voteLog: [...r.voteLog] }
          : r,
      ),
      callQueue: [...s.callQueue],
      acceptances: { ...s.acceptances },
    };
  }

  // ---- reading -------------------------------------------------------------

  get status(): SessionState['status'] {
    return this.state.status;
  }

  /** The session's settings, not copied (they never change after creation): read, never write. */
  get config(): Readonly<SessionConfig> {
    return this.state.config;
  }

  /** The current round (a copy), or null before start. */
  currentRound(): RoundState | null {
    const round = this.round();
    return round ? structuredClone(round) : null;
  }

  /**
   * The current round itself, not a copy: for reading at once (a view, a timing), never for
   * keeping or changing. The hot paths use it; copying a round with every answer in it per call
   * was a large share of the server's time under load (bench profile).
   */
  peekRound(): Readonly<RoundState> | null {
    return this.round() ?? null;
  }

  /** The whole state itself, not a copy (see `peekRound`): for serialising at once. */
  peekState(): Readonly<SessionState> {
    return this.state;
  }

  player(playerId: string): PlayerState | null {
    const p = this.findPlayer(playerId);
    return p ? { ...p } : null;
  }

  /** Deadlines of the open round's active units (empty otherwise). */
  deadlines(): UnitDeadline[] {
    const round = this.openRoundOrNull();
    if (!round) return [];
    const now = this.deps.clock.now();
    return this.activeUnits(round).map((u) => unitDeadline(round, u, now));
  }

  /** The deadline that applies to one player: their own (solo) or their team's. */
  deadlineFor(playerId: string): UnitDeadline | null {
    const round = this.openRoundOrNull();
    const unit = round ? this.unitForPlayer(round, playerId) : undefined;
    return round && unit ? unitDeadline(round, unit, this.deps.clock.now()) : null;
  }

  /**
   * When the server should next call tick(): the earliest deadline still ahead of
   * an unfinished unit, else the round's last deadline. Null when nothing is timed
   * (no open round, or paused).
   */
  nextDeadline(): number | null {
    const round = this.openRoundOrNull();
    if (!round || this.state.status !== 'running') return null;
    const now = this.deps.clock.now();
    const view = this.roundView(round);
    const units = this.activeUnits(round, view);
    const offset = deadlineOffset(round, now);
    let earliest = Number.POSITIVE_INFINITY;
    for (const u of units) {
      const at = offset + u.baseLimitMs;
      if (at > now && at < earliest && !this.unitLocked(u, view)) earliest = at;
    }
    return Number.isFinite(earliest) ? earliest : this.lastDeadline(round, now, units);
  }

  /** Current votes of a team in the open huddle round, for a member who rejoins. */
  teamVotes(teamId: string): VoteView[] {
    const round = this.openRoundOrNull();
    return round ? this.votesOf(round, teamId) : [];
  }

  /** Results of a closed or revealed round, for persistence (not for broadcast before the reveal). */
  roundResults(roundIndex: number): RoundResults | null {
    const results = this.state.rounds[roundIndex]?.results;
    return results ? structuredClone(results) : null;
  }

  /** Full team standings over revealed rounds. */
  standings(): StandingEntry[] {
    return teamStandings(this.state.teams, this.state.rounds);
  }

  /** The standings the class may see, per the session's `standings` setting. */
  classStandings(): StandingEntry[] {
    return classView(this.standings(), this.state.config.standings);
  }

  /** A team's own rank and points: always available to its members. */
  teamStanding(teamId: string): OwnStanding | null {
    return ownStanding(this.standings(), teamId);
  }

  playerStanding(playerId: string): OwnStanding | null {
    const p = this.findPlayer(playerId);
    return p ? this.teamStanding(p.teamId) : null;
  }

  // ---- roster --------------------------------------------------------------

  addTeam(input: TeamInput): EngineResult<{ teamId: string }> {
    if (this.state.status === 'ended') return fail('session_ended', 'The session has ended.');
    if (this.state.teams.some((t) => t.id === input.id)) return fail('duplicate_team', `Team ${input.id} already exists.`);
    const team = { id: input.id, name: input.name ?? input.id };
    this.state.teams.push(team);
    return ok([{ type: 'team_added', audience: SESSION, teamId: team.id, name: team.name }], { teamId: team.id });
  }

  /** Adds a player, also a late joiner while running; they play from the next round. */
  addPlayer(input: PlayerInput): EngineResult<{ player: PlayerState }> {
    if (this.state.status === 'ended') return fail('session_ended', 'The session has ended.');
    if (this.findPlayer(input.id)) return fail('duplicate_player', `Player ${input.id} is already in the session.`);
    if (!this.state.teams.some((t) => t.id === input.teamId)) return fail('unknown_team', `No team ${input.teamId}.`);
    const multiplier = input.timeMultiplier ?? 1;
    if (!isMultiplier(multiplier)) {
      return fail('invalid_multiplier', `Time multiplier must be one of ${TIME_MULTIPLIERS.join(', ')}.`);
    }
    const taken = new Set(
      this.state.players.filter((p) => p.teamId === input.teamId && p.status !== 'removed').map((p) => p.number),
    );
    let number = input.number;
    if (number === undefined) {
      number = 1;
      while (taken.has(number)) number++;
    } else if (!Number.isInteger(number) || number < 1) {
      return fail('invalid_number', 'A member number is a whole number from 1.');
    } else if (taken.has(number)) {
      return fail('duplicate_number', `Number ${number} is already taken in team ${input.teamId}.`);
    }
    const player: PlayerState = { id: input.id, teamId: input.teamId, timeMultiplier: multiplier, number, status: 'connected' };
    this.state.players.push(player);
    this.playerIndex.set(player.id, player);
    return ok([{ type: 'player_added', audience: HOST, playerId: player.id, teamId: player.teamId, number }], {
      player: { ...player },
    });
  }

  markAway(playerId: string): EngineResult {
    return this.setPlayerStatus(playerId, 'away');
  }

  markBack(playerId: string): EngineResult {
    return this.setPlayerStatus(playerId, 'connected');
  }

  /** Removed by the host: their answers no longer count and they cannot answer again. */
  removePlayer(playerId: string): EngineResult {
    return this.setPlayerStatus(playerId, 'removed');
  }

  // ---- session flow --------------------------------------------------------

  start(): EngineResult {
    if (this.state.status !== 'lobby') return fail('not_in_lobby', 'The session has already started.');
    this.state.status = 'running';
    this.state.startedAt = this.deps.clock.now();
    const round = this.pushReadyRound(0);
    return ok(
      [
        { type: 'session_started', audience: SESSION, at: this.state.startedAt },
        { type: 'round_ready', audience: SESSION, roundIndex: round.index, itemId: round.itemId },
      ],
      {},
    );
  }

  /** Opens the ready round: fixes its roster, deadlines and (numbered) the called number. */
  openRound(): EngineResult<{ roundIndex: number }> {
    const blocked = this.requireRunning();
    if (blocked) return blocked;
    const round = this.round();
    if (!round || round.status !== 'ready') return fail('round_not_ready', 'There is no round ready to open.');
    const now = this.deps.clock.now();
    const { format, roundLimitMs } = this.state.config;
    round.status = 'open';
    round.openedAt = now;
    round.roster = this.state.players
      .filter((p) => p.status !== 'removed')
      .map((p) => ({ playerId: p.id, teamId: p.teamId, timeMultiplier: p.timeMultiplier, number: p.number }));
    if (format === 'solo') {
      round.units = round.roster.map((r) => ({ id: r.playerId, kind: 'player', baseLimitMs: roundLimitMs * r.timeMultiplier }));
    } else {
      const largest = new Map<string, number>();
      for (const r of round.roster) largest.set(r.teamId, Math.max(largest.get(r.teamId) ?? 1, r.timeMultiplier));
      round.units = [...largest].map(([teamId, m]) => ({ id: teamId, kind: 'team', baseLimitMs: roundLimitMs * m }));
    }
    if (format === 'numbered') {
      const calledNumber = this.nextCalledNumber();
      round.calls = round.units.map((u) => resolveCall(u.id, calledNumber, round.roster, this.state.players));
    }
    const events: EngineEvent[] = [
      {
        type: 'round_opened',
        audience: SESSION,
        roundIndex: round.index,
        itemId: round.itemId,
        openedAt: now,
        deadlines: this.deadlines(),
        calls: round.calls.map((c) => ({ ...c })),
      },
      this.progressEvent(round),
    ];
    return ok(events, { roundIndex: round.index });
  }

  pause(): EngineResult {
    const blocked = this.requireRunning();
    if (blocked) return blocked;
    const now = this.deps.clock.now();
    this.state.status = 'paused';
    this.state.pausedAt = now;
    const round = this.openRoundOrNull();
    if (round) round.pauses.push({ from: now, to: null });
    return ok([{ type: 'session_paused', audience: SESSION, at: now }], {});
  }

  /** Resumes; the open round's deadlines move later by the paused time. */
  resume(): EngineResult {
    if (this.state.status !== 'paused') return fail('not_paused', 'The session is not paused.');
    const now = this.deps.clock.now();
    const pausedMs = now - (this.state.pausedAt ?? now);
    this.endOpenPause(now);
    this.state.status = 'running';
    this.state.pausedAt = null;
    const events: EngineEvent[] = [
      { type: 'session_resumed', audience: SESSION, at: now, pausedMs, deadlines: this.deadlines() },
    ];
    events.push(...this.autoClose(now));
    return ok(events, {});
  }

  /** Adds time to every deadline of the open round (default 15 s). Allowed while paused. */
  addTime(ms: number = ADD_TIME_MS): EngineResult {
    if (this.state.status === 'ended') return fail('session_ended', 'The session has ended.');
    const round = this.openRoundOrNull();
    if (!round) return fail('round_not_open', 'There is no open round to add time to.');
    if (!(ms > 0) || !Number.isFinite(ms)) return fail('invalid_config', 'Added time must be positive.');
    round.addedMs += ms;
    return ok([{ type: 'time_added', audience: SESSION, roundIndex: round.index, addedMs: ms, deadlines: this.deadlines() }], {});
  }

  /** The host closes the open round early (also while paused). */
  closeRound(): EngineResult {
    if (this.state.status === 'ended') return fail('session_ended', 'The session has ended.');
    const round = this.openRoundOrNull();
    if (!round) return fail('round_not_open', 'There is no open round to close.');
    return ok(this.close(round, 'host', this.deps.clock.now()), {});
  }

  /** Reveals the closed round's results and the standings. */
  reveal(): EngineResult<{ results: RoundResults }> {
    const blocked = this.requireRunning();
    if (blocked) return blocked;
    const round = this.round();
    if (!round || round.status !== 'closed' || !round.results) return fail('round_not_closed', 'There is no closed round to reveal.');
    round.status = 'revealed';
    round.revealedAt = this.deps.clock.now();
    const events: EngineEvent[] = [
      { type: 'round_revealed', audience: SESSION, roundIndex: round.index, itemId: round.itemId, results: structuredClone(round.results) },
      ...this.standingsEvents(),
    ];
    return ok(events, { results: structuredClone(round.results) });
  }

  /** Moves from a revealed round to the next item's ready round. */
  next(): EngineResult<{ roundIndex: number }> {
    const blocked = this.requireRunning();
    if (blocked) return blocked;
    const round = this.round();
    if (!round || round.status !== 'revealed') return fail('round_not_revealed', 'Reveal the round before moving on.');
    if (round.index + 1 >= this.state.config.items.length) return fail('no_more_items', 'That was the last item.');
    const nextRound = this.pushReadyRound(round.index + 1);
    return ok([{ type: 'round_ready', audience: SESSION, roundIndex: nextRound.index, itemId: nextRound.itemId }], {
      roundIndex: nextRound.index,
    });
  }

  /** Ends the session; an open round is closed (results kept for the debrief, not revealed). */
  end(): EngineResult {
    if (this.state.status === 'ended') return fail('session_ended', 'The session has already ended.');
    const now = this.deps.clock.now();
    const events: EngineEvent[] = [];
    const round = this.openRoundOrNull();
    if (round) events.push(...this.close(round, 'ended', now));
    this.endOpenPause(now);
    const wasStarted = this.state.status !== 'lobby';
    this.state.status = 'ended';
    this.state.pausedAt = null;
    this.state.endedAt = now;
    events.push({ type: 'session_ended', audience: SESSION, at: now });
    if (wasStarted) events.push(...this.standingsEvents());
    return ok(events, {});
  }

  /** Called by the server's timer: closes the round when everyone is done or the last deadline passed. */
  tick(): EngineResult {
    if (this.state.status !== 'running') return ok([], {});
    return ok(this.autoClose(this.deps.clock.now()), {});
  }

  // ---- answers -------------------------------------------------------------

  /**
   * An answer (solo, numbered) or a vote (huddle). A resend with the same
   * clientMessageId returns the first acceptance and changes nothing.
   */
  submit(input: SubmitInput): EngineResult<SubmitOk> {
    if (typeof input.clientMessageId !== 'string' || input.clientMessageId.length === 0) {
      return fail('invalid_message_id', 'An answer needs a client message id.');
    }
    const key = acceptanceKey(input.playerId, input.clientMessageId);
    const earlier = this.state.acceptances[key];
    if (earlier) return ok([], { acceptance: { ...earlier }, duplicate: true });

    const now = this.deps.clock.now();
    const at = input.at ?? now;
    const gate = this.answerGate(input.playerId, at, now);
    if ('ok' in gate) return gate;
    const { round, player } = gate;
    const elapsedMs = activeElapsed(round, at, now);
    const choice = canonicalJson(input.response);
    const existing = round.answers.find((a) => a.playerId === player.id);
    const format = this.state.config.format;
    const events: EngineEvent[] = [];

    if (format === 'huddle') {
      if (existing?.locked) return fail('already_locked', 'Your vote is locked in.');
      const lock = input.lock === true;
      if (existing) {
        if (existing.choice !== choice) {
          this.logVote(round, player, existing.choice, choice, at);
          existing.response = structuredClone(input.response);
          existing.choice = choice;
          existing.changedAt = at;
          existing.elapsedMs = elapsedMs;
        }
        existing.locked = lock;
      } else {
        this.logVote(round, player, null, choice, at);
        round.answers.push(this.newAnswer(player, input.response, choice, at, elapsedMs, lock));
      }
    } else {
      if (format === 'numbered') {
        const call = round.calls.find((c) => c.teamId === player.teamId);
        if (round.answers.some((a) => a.teamId === player.teamId)) {
          return fail('already_answered', 'Your team has already answered.');
        }
        if (call?.playerId !== player.id) return fail('not_your_turn', 'Another member of your team was called.');
      } else if (existing) {
        return fail('already_answered', 'You have already answered.');
      }
      round.answers.push(this.newAnswer(player, input.response, choice, at, elapsedMs, true));
    }

    const acceptance: Acceptance = {
      playerId: player.id,
      clientMessageId: input.clientMessageId,
      roundIndex: round.index,
      acceptedAt: at,
      locked: round.answers.find((a) => a.playerId === player.id)?.locked ?? true,
    };
    this.state.acceptances[key] = acceptance;
    events.push({ type: 'answer_accepted', audience: { kind: 'player', playerId: player.id }, acceptance: { ...acceptance } });
    if (format === 'huddle') events.push(this.votesEvent(round, player.teamId));
    events.push(...this.afterChange(round, now));
    return ok(events, { acceptance: { ...acceptance }, duplicate: false });
  }

  /** huddle: lock the current vote in without changing it. */
  lockIn(input: { playerId: string; at?: number }): EngineResult {
    const now = this.deps.clock.now();
    const gate = this.answerGate(input.playerId, input.at ?? now, now);
    if ('ok' in gate) return gate;
    const { round, player } = gate;
    const answer = round.answers.find((a) => a.playerId === player.id);
    if (!answer) return fail('nothing_to_lock', 'Vote before locking in.');
    if (answer.locked) return fail('already_locked', 'Already locked in.');
    answer.locked = true;
    return ok([this.votesEvent(round, player.teamId), ...this.afterChange(round, now)], {});
  }

  // ---- internals -----------------------------------------------------------

  private round(): RoundState | undefined {
    return this.state.rounds[this.state.currentRound];
  }

  private openRoundOrNull(): RoundState | null {
    const round = this.round();
    return round && round.status === 'open' ? round : null;
  }

  private findPlayer(playerId: string): PlayerState | undefined {
    return this.playerIndex.get(playerId);
  }

  private requireRunning(): EngineError | null {
    switch (this.state.status) {
      case 'running':
        return null;
      case 'paused':
        return fail('session_paused', 'The session is paused.');
      case 'ended':
        return fail('session_ended', 'The session has ended.');
      case 'lobby':
        return fail('session_not_running', 'The session has not started.');
    }
  }

  private pushReadyRound(index: number): RoundState {
    const round: RoundState = {
      index,
      itemId: this.state.config.items[index].id,
      status: 'ready',
      openedAt: null,
      closedAt: null,
      revealedAt: null,
      closeReason: null,
      addedMs: 0,
      pauses: [],
      roster: [],
      units: [],
      calls: [],
      answers: [],
      voteLog: [],
      results: null,
    };
    this.state.rounds.push(round);
    this.state.currentRound = this.state.rounds.length - 1;
    return round;
  }

  /** numbered: the next number of the seeded cycle; a new cycle covers 1..largest team size. */
  private nextCalledNumber(): number {
    if (this.state.callQueue.length === 0) {
      const sizes = new Map<string, number>();
      for (const p of this.state.players) {
        if (p.status !== 'removed') sizes.set(p.teamId, (sizes.get(p.teamId) ?? 0) + 1);
      }
      const { cycle, draws } = drawCallCycle(Math.max(1, ...sizes.values()), this.deps.rng);
      this.state.callQueue = cycle;
      this.state.rngDraws += draws;
    }
    return this.state.callQueue.shift() ?? 1;
  }

  /** Checks shared by submit and lockIn, in the order a player would want to hear them. */
  private answerGate(playerId: string, at: number, now: number): EngineError | { round: RoundState; player: PlayerState } {
    const player = this.findPlayer(playerId);
    if (!player) return fail('unknown_player', 'Unknown player.');
    if (player.status === 'removed') return fail('removed', 'You were removed from this session.');
    if (this.state.status === 'ended') return fail('session_ended', 'The session has ended.');
    if (this.state.status === 'paused') return fail('session_paused', 'The session is paused.');
    const round = this.openRoundOrNull();
    if (!round || this.state.status !== 'running') return fail('round_not_open', 'The round is not open.');
    const unit = this.unitForPlayer(round, playerId);
    if (!unit) return fail('round_not_open', 'You joined after this round opened; the next one is yours.');
    if (at < (round.openedAt ?? at)) return fail('round_not_open', 'That answer was sent before the round opened.');
    if (activeElapsed(round, at, now) > unitWindowMs(round, unit)) return fail('too_late', 'Time was up for this round.');
    return { round, player };
  }

  private unitForPlayer(round: RoundState, playerId: string): RoundUnit | undefined {
    const entry = round.roster.find((r) => r.playerId === playerId);
    if (!entry) return undefined;
    const id = this.state.config.format === 'solo' ? entry.playerId : entry.teamId;
    return round.units.find((u) => u.id === id);
  }

  private newAnswer(player: PlayerState, response: unknown, choice: string, at: number, elapsedMs: number, locked: boolean): AnswerRecord {
    return { playerId: player.id, teamId: player.teamId, response: structuredClone(response), choice, changedAt: at, elapsedMs, locked };
  }

  private logVote(round: RoundState, player: PlayerState, from: string | null, to: string, at: number): void {
    this.state.voteSeq += 1;
    round.voteLog.push({ seq: this.state.voteSeq, teamId: player.teamId, playerId: player.id, from, to, at });
  }

  private isRemoved(playerId: string): boolean {
    return this.findPlayer(playerId)?.status === 'removed';
  }

  private isConnected(playerId: string): boolean {
    return this.findPlayer(playerId)?.status === 'connected';
  }

  /** Lookups for one evaluation of the round, so closing checks stay linear in the roster. */
  private roundView(round: RoundState): RoundView {
    const membersByTeam = new Map<string, string[]>();
    for (const r of round.roster) {
      if (this.isRemoved(r.playerId)) continue;
      const members = membersByTeam.get(r.teamId) ?? [];
      members.push(r.playerId);
      membersByTeam.set(r.teamId, members);
    }
    return {
      membersByTeam,
      answeredPlayers: new Set(round.answers.map((a) => a.playerId)),
      answeredTeams: new Set(round.answers.map((a) => a.teamId)),
      lockedPlayers: new Set(round.answers.filter((a) => a.locked).map((a) => a.playerId)),
      callByTeam: new Map(round.calls.map((c) => [c.teamId, c])),
    };
  }

  private membersOf(round: RoundState, teamId: string): string[] {
    return this.roundView(round).membersByTeam.get(teamId) ?? [];
  }

  /** Units that still matter: a solo player not removed, a team with a member not removed. */
  private activeUnits(round: RoundState, view = this.roundView(round)): RoundUnit[] {
    return round.units.filter((u) => (u.kind === 'player' ? !this.isRemoved(u.id) : view.membersByTeam.has(u.id)));
  }

  private unitLocked(unit: RoundUnit, view: RoundView): boolean {
    switch (this.state.config.format) {
      case 'solo':
        return view.answeredPlayers.has(unit.id);
      case 'numbered':
        return view.answeredTeams.has(unit.id);
      case 'huddle': {
        const members = view.membersByTeam.get(unit.id) ?? [];
        const someLocked = members.some((m) => view.lockedPlayers.has(m));
        return someLocked && members.every((m) => view.lockedPlayers.has(m) || !this.isConnected(m));
      }
    }
  }

  /** Whether the unit has someone present who could still answer. */
  private unitPresent(unit: RoundUnit, view: RoundView): boolean {
    switch (this.state.config.format) {
      case 'solo':
        return this.isConnected(unit.id);
      case 'numbered': {
        const called = view.callByTeam.get(unit.id)?.playerId;
        return called != null && this.isConnected(called);
      }
      case 'huddle':
        return (view.membersByTeam.get(unit.id) ?? []).some((m) => this.isConnected(m));
    }
  }

  private lastDeadline(round: RoundState, now: number, units = this.activeUnits(round)): number {
    // The plain round limit is the floor, so a round with nobody in it still ends.
    let longest = this.state.config.roundLimitMs;
    for (const u of units) longest = Math.max(longest, u.baseLimitMs);
    return deadlineOffset(round, now) + longest;
  }

  /**
   * Closes the open round when the last deadline has passed, or when no unit is
   * still pending (pending = not locked in, time left, someone present) and at
   * least one has locked in. Players who are away do not hold the class up.
   */
  /** After an answer or a roster change: the host's progress count, then maybe the close. */
  private afterChange(round: RoundState, now: number): EngineEvent[] {
    const view = this.roundView(round);
    return [this.progressEvent(round, view), ...this.autoClose(now, view)];
  }

  private autoClose(now: number, known?: RoundView): EngineEvent[] {
    const round = this.openRoundOrNull();
    if (!round || this.state.status !== 'running') return [];
    const view = known ?? this.roundView(round);
    const units = this.activeUnits(round, view);
    if (now >= this.lastDeadline(round, now, units)) return this.close(round, 'deadline', now);
    const offset = deadlineOffset(round, now);
    let anyLocked = false;
    for (const u of units) {
      if (this.unitLocked(u, view)) anyLocked = true;
      else if (now < offset + u.baseLimitMs && this.unitPresent(u, view)) return [];
    }
    return anyLocked ? this.close(round, 'all_locked', now) : [];
  }

  private close(round: RoundState, reason: CloseReason, now: number): EngineEvent[] {
    for (const span of round.pauses) if (span.to === null) span.to = now;
    round.status = 'closed';
    round.closedAt = now;
    round.closeReason = reason;
    round.results = computeRoundResults({
      config: this.state.config,
      round,
      players: this.state.players,
      check: this.deps.check,
    });
    return [{ type: 'round_closed', audience: SESSION, roundIndex: round.index, closedAt: now, reason }];
  }

  private endOpenPause(now: number): void {
    const round = this.round();
    if (round) for (const span of round.pauses) if (span.to === null) span.to = now;
  }

  private votesOf(round: RoundState, teamId: string): VoteView[] {
    const members = new Set(this.membersOf(round, teamId));
    return round.answers
      .filter((a) => members.has(a.playerId))
      .map((a) => ({ playerId: a.playerId, response: structuredClone(a.response), locked: a.locked }));
  }

  private votesEvent(round: RoundState, teamId: string): EngineEvent {
    return { type: 'votes_changed', audience: { kind: 'team', teamId }, roundIndex: round.index, teamId, votes: this.votesOf(round, teamId) };
  }

  private progressEvent(round: RoundState, view = this.roundView(round)): EngineEvent {
    const units = this.activeUnits(round, view);
    return {
      type: 'progress',
      audience: HOST,
      roundIndex: round.index,
      lockedIn: units.filter((u) => this.unitLocked(u, view)).length,
      units: units.length,
    };
  }

  private standingsEvents(): EngineEvent[] {
    const entries = this.standings();
    const events: EngineEvent[] = [
      { type: 'standings', audience: SESSION, view: this.state.config.standings, entries: classView(entries, this.state.config.standings) },
    ];
    for (const entry of entries) {
      events.push({
        type: 'team_standing',
        audience: { kind: 'team', teamId: entry.teamId },
        standing: { teamId: entry.teamId, rank: entry.rank, points: entry.points, teamCount: entries.length },
      });
    }
    return events;
  }

  private setPlayerStatus(playerId: string, status: PlayerState['status']): EngineResult {
    const player = this.findPlayer(playerId);
    if (!player) return fail('unknown_player', 'Unknown player.');
    if (player.status === 'removed') return fail('removed', 'That player was removed from the session.');
    if (player.status === status) return ok([], {});
    player.status = status;
    const events: EngineEvent[] = [{ type: 'player_status', audience: HOST, playerId, status }];
    const round = this.openRoundOrNull();
    if (round && round.roster.some((r) => r.playerId === playerId)) {
      events.push(...this.repassCall(round, player.teamId));
      if (this.state.config.format === 'huddle' && status === 'removed') events.push(this.votesEvent(round, player.teamId));
      events.push(...this.afterChange(round, this.deps.clock.now()));
    }
    return ok(events, {});
  }

  /** numbered: when the called member leaves (or someone returns to a team with nobody called), pass the call on. */
  private repassCall(round: RoundState, teamId: string): EngineEvent[] {
    if (this.state.config.format !== 'numbered') return [];
    if (round.answers.some((a) => a.teamId === teamId)) return [];
    const index = round.calls.findIndex((c) => c.teamId === teamId);
    if (index < 0) return [];
    const current = round.calls[index];
    if (current.playerId !== null && this.isConnected(current.playerId)) return [];
    const call: TeamCall = resolveCall(teamId, current.calledNumber, round.roster, this.state.players);
    if (call.playerId === current.playerId) return [];
    round.calls[index] = call;
    return [{ type: 'call_passed', audience: SESSION, roundIndex: round.index, call: { ...call } }];
  }
}
