import { SessionEngine } from './session-engine';
import { FakeClock, makeDeps, makeSession, must, pick, type SessionSpec } from './session-engine.factories';
import type { EngineEvent, SessionState } from './types';

// A restart rebuilds the live session from its stored snapshot (DESIGN.md §7 "Persistence").
// Check: an engine rebuilt mid-round from JSON gives exactly what the original gives.

type Step = (engine: SessionEngine, clock: FakeClock) => { ok: boolean; events?: EngineEvent[] };

function huddleScript(): Step[] {
  return [
    (e) => e.start(),
    (e, c) => (c.at(0), e.openRound()),
    (e, c) => (c.at(2_000), e.submit({ playerId: 'a1', clientMessageId: 'a1-1', response: pick('b') })),
    (e, c) => (c.at(4_000), e.submit({ playerId: 'a2', clientMessageId: 'a2-1', response: pick('a') })),
    (e, c) => (c.at(5_000), e.pause()),
    // ← the restart happens here, mid-round and paused
    (e, c) => (c.at(9_000), e.resume()),
    (e, c) => (c.at(11_000), e.submit({ playerId: 'a1', clientMessageId: 'a1-2', response: pick('a'), lock: true })),
    (e, c) => (c.at(12_000), e.submit({ playerId: 'a1', clientMessageId: 'a1-1', response: pick('b') })),
    (e, c) => (c.at(13_000), e.addTime()),
    (e, c) => (c.at(20_000), e.submit({ playerId: 'b1', clientMessageId: 'b1-1', response: pick('a'), lock: true })),
    // ta's deadline: 45 s (×1.5) + 15 s added + 4 s paused = 64 s.
    (e, c) => (c.at(64_000), e.tick()),
    (e) => e.reveal(),
  ];
}

function numberedScript(rounds: number): Step[] {
  const steps: Step[] = [(e) => e.start()];
  for (let r = 0; r < rounds; r++) {
    steps.push((e, c) => (c.at(r * 100_000), e.openRound()));
    steps.push((e, c) => {
      c.at(r * 100_000 + 3_000 + r * 1_000);
      // Whoever was called on team 'ta' answers.
      const called = e.currentRound()?.calls.find((call) => call.teamId === 'ta')?.playerId ?? 'none';
      return e.submit({ playerId: called, clientMessageId: `r${r}`, response: pick(r % 2 ? 'a' : 'b') });
    });
    steps.push((e) => e.closeRound());
    steps.push((e) => e.reveal());
    if (r < rounds - 1) steps.push((e) => e.next());
  }
  return steps;
}

function run(engine: SessionEngine, clock: FakeClock, steps: Step[]): EngineEvent[][] {
  return steps.map((step) => {
    const result = step(engine, clock);
    expect(result.ok).toBe(true);
    return result.events ?? [];
  });
}

function restartAt(spec: SessionSpec, steps: Step[], cut: number, fastForwardRng = true) {
  const original = makeSession(spec);
  run(original.engine, original.clock, steps.slice(0, cut));
  const stored = JSON.parse(JSON.stringify(original.engine.toSnapshot())) as SessionState;
  const clock = new FakeClock(original.clock.t);
  const rebuilt = SessionEngine.fromSnapshot(stored, makeDeps(spec, clock), { fastForwardRng });
  const rest = steps.slice(cut);
  return {
    original: { engine: original.engine, events: run(original.engine, original.clock, rest) },
    rebuilt: { engine: rebuilt, events: run(rebuilt, clock, rest) },
  };
}

describe(`${SessionEngine.name} snapshots`, () => {
  const huddleSpec: SessionSpec = {
    format: 'huddle',
    itemCount: 1,
    players: [
      { id: 'a1', team: 'ta' },
      { id: 'a2', team: 'ta', mult: 1.5 },
      { id: 'b1', team: 'tb' },
    ],
  };

  it('rolls one submit back through checkpoint() to exactly the state toSnapshot() saw', () => {
    // The live runtime undoes an answer it could not store; checkpoint() must be as good as a full copy.
    const { engine } = makeSession({ ...huddleSpec, itemCount: 2 });
    const clock = new FakeClock();
    // A whole revealed round first, so an earlier round exists to be shared.
    must(engine.start());
    must(engine.openRound());
    clock.at(1_000);
    for (const id of ['a1', 'a2', 'b1']) must(engine.submit({ playerId: id, clientMessageId: `r1-${id}`, response: pick('a'), lock: true }));
    if (engine.currentRound()?.status === 'open') must(engine.closeRound());
    must(engine.reveal());
    must(engine.next());
    must(engine.openRound());
    must(engine.submit({ playerId: 'b1', clientMessageId: 'r2-b1', response: pick('b') }));
    const full = engine.toSnapshot();
    const cheap = engine.checkpoint();
    must(engine.submit({ playerId: 'a1', clientMessageId: 'r2-a1', response: pick('a'), lock: true }));
    expect(engine.toSnapshot()).not.toEqual(full);
    const rolledBack = SessionEngine.fromSnapshot(cheap, makeDeps(huddleSpec, clock), { fastForwardRng: false });
    expect(rolledBack.toSnapshot()).toEqual(full);
  });

  it('rolls back a submit that closed the round (the last lock-in) through checkpoint()', () => {
    // The answer that makes every unit locked closes the round: status, closedAt, results and open
    // pauses all change, and a failed insert must undo every one of them.
    const clock = new FakeClock();
    const { engine } = makeSession(huddleSpec);
    must(engine.start());
    must(engine.openRound());
    clock.at(2_000);
    must(engine.pause());
    clock.at(3_000);
    must(engine.resume());
    for (const id of ['a1', 'a2']) must(engine.submit({ playerId: id, clientMessageId: `c-${id}`, response: pick('a'), lock: true }));
    const full = engine.toSnapshot();
    const cheap = engine.checkpoint();
    const last = engine.submit({ playerId: 'b1', clientMessageId: 'c-b1', response: pick('b'), lock: true });
    must(last);
    expect(engine.currentRound()?.status).toBe('closed');
    const rolledBack = SessionEngine.fromSnapshot(cheap, makeDeps(huddleSpec, clock), { fastForwardRng: false });
    expect(rolledBack.toSnapshot()).toEqual(full);
    expect(rolledBack.currentRound()?.status).toBe('open');
  });

  it('is plain JSON', () => {
    const { engine } = makeSession(huddleSpec);
    run(engine, new FakeClock(), huddleScript().slice(0, 5));
    const snapshot = engine.toSnapshot();
    expect(JSON.parse(JSON.stringify(snapshot))).toEqual(snapshot);
  });

  it('rebuilds a paused huddle round mid-way with the same events and results', () => {
    const { original, rebuilt } = restartAt(huddleSpec, huddleScript(), 5);
    expect(rebuilt.events).toEqual(original.events);
    expect(rebuilt.engine.roundResults(0)).toEqual(original.engine.roundResults(0));
    expect(rebuilt.engine.standings()).toEqual(original.engine.standings());
    // Sanity: the script really scored. T = 45 + 15 s = 60 s. a2: 4 s → 1000·(1 − 0.5·4/60) = 966.67 → 967;
    // a1: changed at 11 s wall, minus 4 s paused = 7 s → 1000·(1 − 0.5·7/60) = 941.67 → 942 (the resend at 12 s changes nothing).
    const players = original.engine.roundResults(0)?.players ?? [];
    expect(players.map((p) => [p.playerId, p.points])).toEqual([
      ['a1', 942],
      ['a2', 967],
      // b1: team tb T = 30 + 15 s = 45 s; 20 s − 4 s paused = 16 s → 1000·(1 − 0.5·16/45) = 822.22 → 822.
      ['b1', 822],
    ]);
  });

  const numberedSpec: SessionSpec = {
    format: 'numbered',
    itemCount: 9,
    seed: 'restart\u0000',
    players: ['ta', 'tb'].flatMap((team) => [1, 2, 3].map((number) => ({ id: `${team}${number}`, team, number }))),
  };

  it('continues the seeded call order after a rebuild mid-round', () => {
    // Cut inside round 1 (after its openRound); rounds 3..8 need two more seeded cycles.
    const steps = numberedScript(9);
    const { original, rebuilt } = restartAt(numberedSpec, steps, 7);
    expect(rebuilt.events).toEqual(original.events);
    expect(rebuilt.engine.standings()).toEqual(original.engine.standings());
  });

  it('would drift without the rng fast-forward (the check above can fail)', () => {
    const steps = numberedScript(9);
    const { original, rebuilt } = restartAt(numberedSpec, steps, 7, false);
    const calls = (events: EngineEvent[][]) =>
      events.flat().flatMap((e) => (e.type === 'round_opened' ? [e.calls[0].calledNumber] : []));
    expect(calls(rebuilt.events)).not.toEqual(calls(original.events));
  });
});
