import { execFileSync } from 'node:child_process';
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import * as path from 'node:path';
import {
  checkHistory,
  checkRejoin,
  connectHostTo,
  connectPlayerTo,
  deadlinesOf,
  History,
  hostCommand,
  nextState,
  resync,
  standingOf,
  submitAnswer,
  until,
  type Player,
  type Standing,
} from '../helpers/history';
import { FaultRig, rightAnswer, wrongAnswer } from './fault-table';

// The project's own cluster, as scripts/lib.sh start_postgres lays it out (relative to the repo root).
const DATA = path.resolve(__dirname, '../../../.data');
const PGDATA = path.join(DATA, 'pg');
const PGRUN = path.join(DATA, 'run');
const PGLOG = path.join(DATA, 'postgres.log');

function pgBin(): string | null {
  try {
    const dirs = readdirSync('/usr/lib/postgresql')
      .map((v) => `/usr/lib/postgresql/${v}/bin`)
      .filter((d) => existsSync(`${d}/pg_ctl`))
      .sort((a, b) => a.localeCompare(b, undefined, { numeric: true }));
    return dirs.at(-1) ?? null;
  } catch {
    return null;
  }
}

/** The cluster port from .data/pg.port, when DATABASE_URL points at that cluster. */
function ownClusterPort(): number | null {
  const portFile = path.join(DATA, 'pg.port');
  if (!existsSync(path.join(PGDATA, 'PG_VERSION')) || !existsSync(portFile) || !pgBin()) return null;
  const port = Number(readFileSync(portFile, 'utf8').trim());
  const url = new URL(process.env.DATABASE_URL ?? 'postgres://x@127.0.0.1:1/x');
  return Number(url.port) === port && ['127.0.0.1', 'localhost'].includes(url.hostname) ? port : null;
}

/** pg_ctl as the cluster's owner (lib.sh as_pg: `postgres` when we are root). */
function pgCtl(args: string[]): void {
  const cmd = [`${pgBin()}/pg_ctl`, ...args];
  const quoted = cmd.map((a) => `'${a.replace(/'/g, `'\\''`)}'`).join(' ');
  if (process.getuid?.() === 0) execFileSync('su', ['postgres', '-s', '/bin/bash', '-c', quoted], { stdio: 'pipe', timeout: 70_000 });
  else execFileSync(cmd[0], cmd.slice(1), { stdio: 'pipe', timeout: 70_000 });
}

const stopPostgres = () => pgCtl(['-D', PGDATA, '-m', 'fast', '-w', 'stop']);
// The same options as scripts/lib.sh start_postgres.
const startPostgres = (port: number) =>
  pgCtl(['-D', PGDATA, '-l', PGLOG, '-w', '-t', '60', '-o', `-p ${port} -k ${PGRUN} -c listen_addresses=127.0.0.1 -c max_connections=300`, 'start']);
function postgresRunning(): boolean {
  try {
    pgCtl(['-D', PGDATA, 'status']);
    return true;
  } catch {
    return false;
  }
}

const PG_PORT = ownClusterPort();
/** Stopping the cluster needs it to be ours; elsewhere (a managed database) the test cannot run. */
const itWithOwnCluster = PG_PORT ? it : it.skip;

/**
 * Crashes: the server killed with SIGKILL and started again; PostgreSQL stopped and
 * started. DESIGN.md §8: no acknowledged answer is ever lost, not on a server kill and
 * restart or a database restart. The database test runs last: it stops the shared cluster.
 */
describe('live sessions across crashes (integration: built server, fault proxy, PostgreSQL)', () => {
  const rig = new FaultRig();
  rig.hooks();
  const right = rightAnswer;
  const wrong = wrongAnswer;


  it('SIGKILL mid-round and a restart: every acknowledged answer is there after the reveal; players rejoin on their team with their points', async () => {
    const t = await rig.table(6, 20, 'sigkill', 'Kiln');
    const { history, players } = t;
    await Promise.all(players.map((p, i) => submitAnswer(history, p, `k-${i}-r0`, 0, i % 2 ? right(t, 0) : wrong(t, 0))));
    await until(() => players.every((p) => p.closed.has(0)), 3000, 'round 0 to close');
    expect(await hostCommand(t.host, { type: 'reveal' })).toMatchObject({ ok: true });
    expect(await hostCommand(t.host, { type: 'next' })).toMatchObject({ ok: true });
    expect(await hostCommand(t.host, { type: 'open_round' })).toMatchObject({ ok: true });
    await until(() => players.every((p) => p.deadlines.has(1)), 5000, 'round 1 to open');
    const before = new Map<string, Standing>();
    for (const p of players) before.set(p.playerId, standingOf(await resync(p)));
    expect([...before.values()].some((s) => (s.ownPoints ?? 0) > 0)).toBe(true);

    // Three answers acknowledged before the crash; three in flight when it comes: two of them stored
    // with their acks still held 150 ms in the proxy (lost with the kill), one sent at the kill itself.
    const acked = await Promise.all(players.slice(0, 3).map((p, i) => submitAnswer(history, p, `k-${i}-r1`, 1, right(t, 1))));
    expect(acked.every((o) => o.outcome === 'ok')).toBe(true);
    const seen = new Map(players.map((p) => [p.playerId, p.states.length]));
    t.proxies[3].setProfile({ delayMs: 150 });
    t.proxies[4].setProfile({ delayMs: 150 });
    const send = (i: number) => submitAnswer(history, players[i], `k-${i}-r1`, 1, wrong(t, 1), { ackTimeoutMs: 2000, giveUpAfterMs: 20_000 });
    const inFlight = [send(3), send(4)];
    await until(async () => (await rig.db.query(`SELECT 1 FROM responses WHERE client_message_id IN ('k-3-r1', 'k-4-r1')`)).length === 2, 2000, 'the delayed answers to be stored');
    inFlight.push(send(5));
    await new Promise((r) => setImmediate(r));
    const killedAt = Date.now();
    await rig.server.kill('SIGKILL');
    await rig.server.restart();
    const restartMs = Date.now() - killedAt;

    const after = new Map<string, Standing>();
    for (const p of players) after.set(p.playerId, standingOf(await nextState(p, seen.get(p.playerId)!, 15_000)));
    expect(checkRejoin(before, after)).toEqual([]);
    const late = await Promise.all(inFlight);
    expect(late.map((o) => o.outcome)).toEqual(['ok', 'ok', 'ok']);
    // Stored before the kill, ack lost with it: the restored session recognises the resend.
    expect(late.slice(0, 2).map((o) => [o.attempt, o.duplicate])).toEqual([
      [2, true],
      [2, true],
    ]);
    // Resending an acknowledged answer across the restart is recognised as the same answer.
    const resent = await submitAnswer(history, players[0], 'k-0-r1', 1, right(t, 1));
    expect(resent).toMatchObject({ outcome: 'ok', duplicate: true });

    const host = await connectHostTo(rig.server.url, t.fx.sessionId, t.fx.cookie);
    rig.track(host);
    await until(() => players.every((p) => p.closed.has(1)), 5000, 'round 1 to close (everyone answered)');
    expect(await hostCommand(host, { type: 'reveal' })).toMatchObject({ ok: true });
    expect(await checkHistory(rig.db, history, { sessionId: t.fx.sessionId, deadlines: deadlinesOf(players) })).toEqual([]);
    expect(await rig.scored(t.fx.sessionId, 1)).toHaveLength(6);
    expect(rig.server.crashes).toEqual([]);
    expect(restartMs).toBeLessThan(15_000);
    await hostCommand(host, { type: 'end' });
  }, 60_000);

  // Last in this file: it stops the cluster every suite shares. Kept short; restarted in `finally`.
  itWithOwnCluster('PostgreSQL stopped and started mid-round: answers are refused (never acknowledged and lost), then the session goes on', async () => {
    const t = await rig.table(4, 30, 'pgstop', 'Kiln');
    const { history, players } = t;
    const first = await submitAnswer(history, players[0], 'pg-0-r0', 0, right(t, 0));
    expect(first).toMatchObject({ outcome: 'ok', duplicate: false });

    let down: { submit: Awaited<ReturnType<typeof submitAnswer>>; host: any; health: number } | null = null;
    try {
      stopPostgres();
      const submit = await submitAnswer(history, players[1], 'pg-1-r0', 0, right(t, 0), { ackTimeoutMs: 4000, giveUpAfterMs: 0 });
      const host = await hostCommand(t.host, { type: 'add_time' });
      down = { submit, host, health: await rig.server.health() };
    } finally {
      if (!postgresRunning()) startPostgres(PG_PORT!);
    }
    expect(rig.server.crashes).toEqual([]);
    // While down: a clear refusal (docs/protocol.md `storage_unavailable`), never an ok.
    expect(down.submit).toMatchObject({ outcome: 'refused', error: 'storage_unavailable' });
    expect(down.host).toMatchObject({ ok: false, error: 'storage_unavailable' });
    expect(down.health).toBe(503);

    await rig.server.waitHealthy(15_000);
    // Back up: the same id again (the pool may need a moment to replace its dead connections).
    const again = await submitAnswer(history, players[1], 'pg-1-r0', 0, right(t, 0), { retryOn: ['storage_unavailable'], giveUpAfterMs: 10_000 });
    expect(again).toMatchObject({ outcome: 'ok', duplicate: false });
    const rest = await Promise.all(players.slice(2).map((p, i) => submitAnswer(history, p, `pg-${i + 2}-r0`, 0, wrong(t, 0), { retryOn: ['storage_unavailable'] })));
    expect(rest.every((o) => o.outcome === 'ok')).toBe(true);
    await until(() => players.every((p) => p.closed.has(0)), 5000, 'round 0 to close');
    expect(await hostCommand(t.host, { type: 'reveal' })).toMatchObject({ ok: true });
    expect(await checkHistory(rig.db, history, { sessionId: t.fx.sessionId, deadlines: deadlinesOf(players) })).toEqual([]);
    expect(await rig.scored(t.fx.sessionId, 0)).toHaveLength(4);
    expect(rig.server.crashes).toEqual([]);
    await hostCommand(t.host, { type: 'end' });
  }, 60_000);
});
