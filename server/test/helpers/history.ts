import { NAMESPACES, PROTOCOL_VERSION, type PlayerSessionView } from '@covalent/shared-types';
import { io, type Socket } from 'socket.io-client';
import type { DataSource } from 'typeorm';

/**
 * A Jepsen-style history of answer submissions (jepsen-io/jepsen: clients record
 * invoke/complete pairs, a checker validates the whole history afterwards).
 * Times are the test process's wall clock, the same host as the server's.
 */
export type Outcome = 'ok' | 'refused' | 'timeout';

export interface Op {
  player: string;
  clientMessageId: string;
  roundIndex: number;
  attempt: number;
  invokedAt: number;
  completedAt: number | null;
  outcome: Outcome | null;
  /** ok: the server's acceptedAt and whether it was a resend; refused: the error code. */
  acceptedAt?: number;
  duplicate?: boolean;
  error?: string;
}

export class History {
  readonly ops: Op[] = [];

  invoke(player: string, clientMessageId: string, roundIndex: number): Op {
    const attempt = this.ops.filter((o) => o.player === player && o.clientMessageId === clientMessageId).length + 1;
    const op: Op = { player, clientMessageId, roundIndex, attempt, invokedAt: Date.now(), completedAt: null, outcome: null };
    this.ops.push(op);
    return op;
  }

  complete(op: Op, ack: unknown): void {
    op.completedAt = Date.now();
    const a = ack as { ok?: boolean; error?: string; duplicate?: boolean; acceptedAt?: number };
    if (a && a.ok === true) {
      op.outcome = 'ok';
      op.acceptedAt = a.acceptedAt;
      op.duplicate = a.duplicate;
    } else {
      op.outcome = 'refused';
      op.error = a?.error ?? 'malformed_ack';
    }
  }

  timeout(op: Op, reason: string): void {
    op.completedAt = Date.now();
    op.outcome = 'timeout';
    op.error = reason;
  }

  /** (player, clientMessageId) pairs with at least one ok ack. */
  acknowledged(): Map<string, Op[]> {
    const out = new Map<string, Op[]>();
    for (const o of this.ops) {
      if (o.outcome !== 'ok') continue;
      const key = `${o.player}|${o.clientMessageId}`;
      out.set(key, [...(out.get(key) ?? []), o]);
    }
    return out;
  }

  /** Every op of one answer, by attempt. */
  of(player: string, clientMessageId: string): Op[] {
    return this.ops.filter((o) => o.player === player && o.clientMessageId === clientMessageId);
  }

  count(outcome: Outcome, error?: string): number {
    return this.ops.filter((o) => o.outcome === outcome && (error === undefined || o.error === error)).length;
  }
}

// ---------------------------------------------------------------- a player client that keeps a history

export interface Player {
  playerId: string;
  token: string;
  socket: Socket;
  /** Every session:state this player received, latest last. */
  states: PlayerSessionView[];
  /** deadlineAt of each round:opened, by round index. */
  deadlines: Map<number, number>;
  /** Rounds this player heard close. */
  closed: Set<number>;
  disconnects: number;
}

/**
 * A player socket as the player app opens it: WebSocket only, reconnection on with
 * short delays (client-options.md: defaults 1 s / 5 s; shortened to keep tests fast).
 */
export function connectPlayerTo(url: string, p: { playerId: string; token: string }): Promise<Player> {
  const socket = io(`${url}${NAMESPACES.player}`, {
    auth: { token: p.token, protocolVersion: PROTOCOL_VERSION },
    transports: ['websocket'],
    forceNew: true,
    reconnection: true,
    reconnectionDelay: 200,
    reconnectionDelayMax: 1000,
    randomizationFactor: 0.2,
    timeout: 5000,
  });
  const player: Player = { ...p, socket, states: [], deadlines: new Map(), closed: new Set(), disconnects: 0 };
  socket.on('round:closed', (e: { roundIndex: number }) => player.closed.add(e.roundIndex));
  socket.on('session:state', (v: PlayerSessionView) => {
    player.states.push(v);
    const t = v.round?.timing;
    if (t?.deadlineAt != null && t.status === 'open') player.deadlines.set(t.roundIndex, t.deadlineAt);
    // A round can close while the player is away (e.g. during a restore): the view says so.
    if (t && (t.status === 'closed' || t.status === 'revealed')) player.closed.add(t.roundIndex);
  });
  socket.on('round:opened', (e: { roundIndex: number; timing: { deadlineAt: number | null } }) => {
    if (e.timing.deadlineAt != null) player.deadlines.set(e.roundIndex, e.timing.deadlineAt);
  });
  socket.on('disconnect', () => player.disconnects++);
  return new Promise((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error(`player ${p.playerId} did not connect`)), 8000);
    socket.once('session:state', () => {
      clearTimeout(timer);
      resolve(player);
    });
  });
}

/** Waits until the player's socket has a session:state newer than `after` (the count of states seen). */
export async function nextState(player: Player, after: number, timeoutMs = 15_000): Promise<PlayerSessionView> {
  const end = Date.now() + timeoutMs;
  while (player.states.length <= after) {
    if (Date.now() > end) throw new Error(`player ${player.playerId}: no new session:state within ${timeoutMs} ms`);
    await new Promise((r) => setTimeout(r, 20));
  }
  return player.states[player.states.length - 1];
}

export interface SubmitOptions {
  ackTimeoutMs?: number;
  /** Give up after this long (ms from the first attempt); the last attempt's outcome stands. */
  giveUpAfterMs?: number;
  /** Refusals worth another try with the same id (e.g. storage_unavailable); others are final. */
  retryOn?: string[];
  /** Pause between a retryable refusal and the next attempt. */
  retryDelayMs?: number;
}

/**
 * One answer, sent like a careful client: ack timeout, then the SAME clientMessageId again
 * until an ack arrives (at-least-once + idempotency key: socket.io delivery-guarantees.md).
 * A refusal is final. Resolves with the last op.
 */
export async function submitAnswer(
  history: History,
  player: Player,
  clientMessageId: string,
  roundIndex: number,
  response: object,
  opts: SubmitOptions = {},
): Promise<Op> {
  const ackTimeoutMs = opts.ackTimeoutMs ?? 3000;
  const end = Date.now() + (opts.giveUpAfterMs ?? 20_000);
  for (;;) {
    const op = history.invoke(player.playerId, clientMessageId, roundIndex);
    try {
      const ack = await player.socket.timeout(ackTimeoutMs).emitWithAck('answer:submit', { clientMessageId, roundIndex, response });
      history.complete(op, ack);
      if (op.outcome === 'refused' && opts.retryOn?.includes(op.error!) && Date.now() < end) {
        await new Promise((r) => setTimeout(r, opts.retryDelayMs ?? 250));
        continue;
      }
      return op;
    } catch (err) {
      history.timeout(op, (err as Error).message);
      if (Date.now() > end) return op;
      // After a drop, wait for the reconnect rather than filling the client's send buffer.
      if (!player.socket.connected) await waitConnected(player, Math.max(0, end - Date.now()));
    }
  }
}

async function waitConnected(player: Player, timeoutMs: number): Promise<void> {
  if (player.socket.connected) return;
  await new Promise<void>((resolve) => {
    const timer = setTimeout(done, timeoutMs);
    function done() {
      clearTimeout(timer);
      player.socket.off('connect', done);
      resolve();
    }
    player.socket.once('connect', done);
  });
}

/** The host screen's socket, straight to the server (the faults are the players'). */
export function connectHostTo(url: string, sessionId: string, cookie: string): Promise<Socket> {
  const socket = io(`${url}${NAMESPACES.host}`, {
    auth: { sessionId, protocolVersion: PROTOCOL_VERSION },
    extraHeaders: { cookie },
    transports: ['websocket'],
    forceNew: true,
    reconnection: true,
    reconnectionDelay: 200,
    reconnectionDelayMax: 1000,
  });
  return new Promise((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error('host did not connect')), 8000);
    socket.once('host:state', () => {
      clearTimeout(timer);
      resolve(socket);
    });
  });
}

/** A host command; resolves with the ack. */
export function hostCommand(host: Socket, command: object): Promise<any> {
  return host.timeout(5000).emitWithAck('host:command', command);
}

/** The player's current view straight from the server (session:resync). */
export async function resync(player: Player): Promise<PlayerSessionView> {
  const ack = await player.socket.timeout(5000).emitWithAck('session:resync', {});
  if (!ack?.ok) throw new Error(`resync refused: ${JSON.stringify(ack)}`);
  return ack.view as PlayerSessionView;
}

/** Polls until `cond` holds. */
export async function until(cond: () => boolean | Promise<boolean>, timeoutMs: number, what: string): Promise<void> {
  const end = Date.now() + timeoutMs;
  while (!(await cond())) {
    if (Date.now() > end) throw new Error(`timed out after ${timeoutMs} ms waiting for ${what}`);
    await new Promise((r) => setTimeout(r, 25));
  }
}

// ---------------------------------------------------------------- the checker

interface StoredRow {
  player_id: string;
  client_message_id: string;
  round_index: number;
  received_ms: string;
  final: boolean;
  points: number | null;
}

export interface CheckInput {
  sessionId: string;
  /** Each player's deadline (server clock, ms) per round, as the server announced it. */
  deadlines: Map<string, Map<number, number>>;
}

/**
 * The invariants of BENCHMARK.md §5 / DESIGN.md §8 against the responses table:
 * 1. every acknowledged answer is stored exactly once, at the time its ack named;
 * 2. no stored answer was received after its deadline, and none after it is scored;
 * 3. nothing is stored that nobody sent.
 * Returns the violations (empty when the history is valid).
 */
export async function checkHistory(db: DataSource, history: History, input: CheckInput): Promise<string[]> {
  const rows: StoredRow[] = await db.query(
    `SELECT player_id, client_message_id, round_index, (extract(epoch from received_at) * 1000)::bigint::text AS received_ms, final, points
       FROM responses WHERE session_id = $1 AND kind = 'answer'`,
    [input.sessionId],
  );
  const violations: string[] = [];
  const byKey = new Map<string, StoredRow[]>();
  for (const r of rows) {
    const key = `${r.player_id}|${r.client_message_id}`;
    byKey.set(key, [...(byKey.get(key) ?? []), r]);
  }
  for (const [key, oks] of history.acknowledged()) {
    const stored = byKey.get(key) ?? [];
    if (stored.length !== 1) {
      violations.push(`acknowledged ${key} is stored ${stored.length} times`);
      continue;
    }
    const at = Number(stored[0].received_ms);
    for (const ok of oks) {
      // received_at is timestamptz (microseconds); acceptedAt is the same instant in ms.
      if (ok.acceptedAt !== undefined && Math.abs(ok.acceptedAt - at) > 1) violations.push(`${key}: ack says acceptedAt ${ok.acceptedAt}, row says ${at}`);
    }
  }
  const sent = new Set(history.ops.map((o) => `${o.player}|${o.clientMessageId}`));
  for (const r of rows) {
    const key = `${r.player_id}|${r.client_message_id}`;
    if (!sent.has(key)) violations.push(`stored ${key} was never sent`);
    const deadline = input.deadlines.get(r.player_id)?.get(r.round_index);
    if (deadline === undefined) {
      violations.push(`no known deadline for ${key} (round ${r.round_index})`);
      continue;
    }
    if (Number(r.received_ms) > deadline) violations.push(`${key} received at ${r.received_ms}, after its deadline ${deadline}`);
  }
  for (const o of history.ops) {
    if (o.outcome !== 'ok' || o.acceptedAt === undefined) continue;
    const deadline = input.deadlines.get(o.player)?.get(o.roundIndex);
    if (deadline !== undefined && o.acceptedAt > deadline) violations.push(`${o.player}|${o.clientMessageId} acknowledged as accepted at ${o.acceptedAt}, after ${deadline}`);
  }
  return violations;
}

/** Deadlines as each player's socket heard them. */
export function deadlinesOf(players: Player[]): Map<string, Map<number, number>> {
  return new Map(players.map((p) => [p.playerId, p.deadlines]));
}

/** What a player must find again after coming back: their team and their points. */
export interface Standing {
  teamId: string | null;
  teamMembers: string[];
  ownPoints: number | null;
  summaryPoints: number;
  answered: number;
}

export function standingOf(view: PlayerSessionView): Standing {
  return {
    teamId: view.you.teamId,
    teamMembers: (view.team?.members ?? []).map((m) => m.playerId).sort(),
    ownPoints: view.ownStanding?.points ?? null,
    summaryPoints: view.summary.points,
    answered: view.summary.answered,
  };
}

/** Every player who came back is on their team with their points: `after` against what the server said before. */
export function checkRejoin(before: Map<string, Standing>, after: Map<string, Standing>): string[] {
  const violations: string[] = [];
  for (const [player, was] of before) {
    const now = after.get(player);
    if (!now) {
      violations.push(`${player} did not come back`);
      continue;
    }
    if (now.teamId !== was.teamId) violations.push(`${player}: team ${was.teamId} → ${now.teamId}`);
    if (now.teamMembers.join() !== was.teamMembers.join()) violations.push(`${player}: team members changed`);
    if (now.ownPoints !== was.ownPoints) violations.push(`${player}: team points ${was.ownPoints} → ${now.ownPoints}`);
    if (now.summaryPoints !== was.summaryPoints) violations.push(`${player}: own points ${was.summaryPoints} → ${now.summaryPoints}`);
  }
  return violations;
}
