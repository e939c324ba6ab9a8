import seedrandom from 'seedrandom';
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

/**
 * Network faults between players and the real (built) server, through our TCP fault
 * proxy, one proxy per player so a fault hits exactly the players chosen. Invariants
 * (BENCHMARK.md §5, DESIGN.md §8): every acknowledged answer is stored exactly once,
 * nothing received after its deadline is scored, late answers get a clear refusal.
 */
describe('live sessions under network faults (integration: built server, fault proxy, PostgreSQL)', () => {
  const rig = new FaultRig();
  rig.hooks(() => expect(rig.server.crashes).toEqual([]));
  const right = rightAnswer;
  const wrong = wrongAnswer;
  const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));


  it('40 ± 20 ms delay on every player: the round completes and every acknowledged answer is stored once', async () => {
    const t = await rig.table(6, 8, 'delay', 'Lab', { delayMs: 40, jitterMs: 20 });
    const rng = seedrandom('delay:think');
    // Think times U(0, 1.5) s (a compressed BENCHMARK.md §8 arrival pattern).
    const ops = await Promise.all(
      t.players.map(async (p, i) => {
        await sleep(rng() * 1500);
        return submitAnswer(t.history, p, `delay-${i}-r0`, 0, i % 2 ? right(t, 0) : wrong(t, 0));
      }),
    );
    expect(ops.map((o) => [o.outcome, o.duplicate])).toEqual(t.players.map(() => ['ok', false]));
    // Every ack crossed the proxy twice, each way at least 40 − 20 = 20 ms late.
    for (const o of ops) expect(o.completedAt! - o.invokedAt).toBeGreaterThanOrEqual(40);
    await until(() => t.players.every((p) => p.closed.has(0)), 3000, 'round 0 to close (everyone answered)');
    expect(await hostCommand(t.host, { type: 'reveal' })).toMatchObject({ ok: true });
    expect(await checkHistory(rig.db, t.history, { sessionId: t.fx.sessionId, deadlines: deadlinesOf(t.players) })).toEqual([]);
    expect(await rig.scored(t.fx.sessionId, 0)).toHaveLength(6);
    await hostCommand(t.host, { type: 'end' });
  }, 30_000);

  /*
   * The server runs socket.io's default heartbeat (no pingInterval/pingTimeout in SOCKET_OPTIONS:
   * 25 s / 20 s, socket.io server-options docs). A hole shorter than pingTimeout never
   * fails a heartbeat, so the socket stays "connected" on both ends and the held bytes arrive
   * late. So a 10 s hole here tests late delivery, not a reconnect.
   */
  it('a 10 s blackhole for a fifth of the players: held answers count once if in time, are refused as too_late after the deadline', async () => {
    const t = await rig.table(10, 12, 'blackhole', 'Lab');
    const opened = Date.now();
    const [inTime, late, ...rest] = t.players;
    const history = t.history;
    const send = (p: Player, id: string) => submitAnswer(history, p, id, 0, right(t, 0), { ackTimeoutMs: 3000, giveUpAfterMs: 16_000 });

    const hole = async (i: number, from: number, ms: number) => {
      await sleep(from - (Date.now() - opened));
      t.proxies[i].setProfile({ blackhole: true });
      await sleep(ms);
      t.proxies[i].setProfile({ blackhole: false });
    };
    const holes = Promise.all([hole(0, 500, 10_000), hole(1, 3000, 10_000)]);
    const others = Promise.all(rest.map((p, i) => sleep(200 + i * 150).then(() => send(p, `bh-${i + 2}-r0`))));
    await sleep(1000 - (Date.now() - opened));
    const inTimeOp = send(inTime, 'bh-0-r0'); // sent at ~1 s, held until ~10.5 s; deadline 12 s
    await sleep(3500 - (Date.now() - opened));
    const lateOp = send(late, 'bh-1-r0'); // sent at ~3.5 s, held until ~13 s: past the deadline
    const [, restOps, a, b] = await Promise.all([holes, others, inTimeOp, lateOp]);

    expect(restOps.every((o) => o.outcome === 'ok' && o.duplicate === false)).toBe(true);
    // The hole outlasted the ack timeout, so the client resent the same id; the server took the first, the rest were resends.
    expect(history.of(inTime.playerId, 'bh-0-r0').length).toBeGreaterThan(1);
    expect(a).toMatchObject({ outcome: 'ok', duplicate: true });
    expect(b).toMatchObject({ outcome: 'refused', error: 'too_late' });
    expect(inTime.disconnects + late.disconnects).toBe(0);
    await until(() => rest.every((p) => p.closed.has(0)), 3000, 'round 0 to close at its deadline');
    expect(await hostCommand(t.host, { type: 'reveal' })).toMatchObject({ ok: true });

    expect(await checkHistory(rig.db, history, { sessionId: t.fx.sessionId, deadlines: deadlinesOf(t.players) })).toEqual([]);
    const rows: { player_id: string }[] = await rig.db.query(`SELECT player_id FROM responses WHERE session_id = $1`, [t.fx.sessionId]);
    expect(rows.filter((r) => r.player_id === inTime.playerId)).toHaveLength(1);
    expect(rows.filter((r) => r.player_id === late.playerId)).toHaveLength(0);
    expect(await rig.scored(t.fx.sessionId, 0)).toHaveLength(9);
    await hostCommand(t.host, { type: 'end' });
  }, 40_000);

  it('connection resets mid-round: players reconnect with their tokens, resend with the same id, count once, keep team and points', async () => {
    const t = await rig.table(6, 12, 'reset', 'Lab');
    const { history, players } = t;
    // Round 0, no faults: everyone answers, the reveal gives points to come back to.
    await Promise.all(players.map((p, i) => submitAnswer(history, p, `rs-${i}-r0`, 0, i < 3 ? right(t, 0) : wrong(t, 0))));
    await until(() => players.every((p) => p.closed.has(0)), 3000, 'round 0 to close');
    expect(await hostCommand(t.host, { type: 'reveal' })).toMatchObject({ ok: true });
    expect(await hostCommand(t.host, { type: 'next' })).toMatchObject({ ok: true });
    expect(await hostCommand(t.host, { type: 'open_round' })).toMatchObject({ ok: true });
    await until(() => players.every((p) => p.deadlines.has(1)), 5000, 'round 1 to open');
    const before = new Map<string, Standing>();
    for (const p of players) before.set(p.playerId, standingOf(await resync(p)));
    expect([...before.values()].some((s) => (s.ownPoints ?? 0) > 0)).toBe(true);

    const [ackLost, sendLost, idle] = players;
    const seen = new Map(players.map((p) => [p.playerId, p.states.length]));

    // Ack lost: the answer reaches the server (250 ms up), the ack is on its way back (250 ms down) when the line resets.
    t.proxies[0].setProfile({ delayMs: 250 });
    const ackLostOp = submitAnswer(history, ackLost, 'rs-0-r1', 1, right(t, 1));
    // Answer lost: held in a black hole, then the line resets; the server never saw it.
    t.proxies[1].setProfile({ blackhole: true });
    const sendLostOp = submitAnswer(history, sendLost, 'rs-1-r1', 1, right(t, 1));
    await sleep(380);
    expect(t.proxies[0].resetConnections()).toBe(1);
    expect(t.proxies[1].resetConnections()).toBe(1);
    expect(t.proxies[2].resetConnections()).toBe(1); // idle: nothing in flight
    const [a, b] = await Promise.all([ackLostOp, sendLostOp]);

    expect(history.of(ackLost.playerId, 'rs-0-r1').map((o) => o.outcome)).toEqual(['timeout', 'ok']);
    expect(a.duplicate).toBe(true); // stored before the reset: the resend is recognised
    expect(history.of(sendLost.playerId, 'rs-1-r1').map((o) => o.outcome)).toEqual(['timeout', 'ok']);
    expect(b.duplicate).toBe(false); // never arrived: the resend is the first copy
    const after = new Map<string, Standing>();
    for (const p of [ackLost, sendLost, idle]) {
      expect(p.disconnects).toBe(1);
      after.set(p.playerId, standingOf(await nextState(p, seen.get(p.playerId)!)));
    }
    expect(checkRejoin(new Map([...before].filter(([id]) => after.has(id))), after)).toEqual([]);

    const restOps = await Promise.all(players.slice(2).map((p, i) => submitAnswer(history, p, `rs-${i + 2}-r1`, 1, wrong(t, 1))));
    expect(restOps.every((o) => o.outcome === 'ok')).toBe(true);
    await until(() => players.every((p) => p.closed.has(1)), 3000, 'round 1 to close');
    expect(await hostCommand(t.host, { type: 'reveal' })).toMatchObject({ ok: true });
    expect(await checkHistory(rig.db, history, { sessionId: t.fx.sessionId, deadlines: deadlinesOf(players) })).toEqual([]);
    expect(await rig.scored(t.fx.sessionId, 1)).toHaveLength(6);
    await hostCommand(t.host, { type: 'end' });
  }, 40_000);
});
