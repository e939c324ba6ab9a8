import seedrandom from 'seedrandom';
import { shuffle } from 'simple-statistics';
import { drawCallCycle, seededShuffle } from './call-order';
import { SessionEngine } from './session-engine';
import { T0, eventsOfType, makeSession, msgId, must, pick } from './session-engine.factories';

// Rules: DESIGN.md §4 "Formats" (numbered) and "Points"; points worked by hand with
// points = round(1000 · c · (1 − w · t/T)), w = 0.5.

/** An rng that always returns 0: Fisher–Yates on [1, 2, 3] then swaps a[2]↔a[0] and a[1]↔a[0] → [2, 3, 1]. */
const zeroRng = (): number => 0;

function carbonNeon() {
  // carbon: #1..#3, all ×1 → T = 30 s. neon: #1, #2 (×1.25) → T = 37.5 s. Largest team: 3 → cycle of 1..3.
  return makeSession({
    format: 'numbered',
    itemCount: 3,
    rng: zeroRng,
    players: [
      { id: 'c1', team: 'carbon', number: 1 },
      { id: 'c2', team: 'carbon', number: 2 },
      { id: 'c3', team: 'carbon', number: 3 },
      { id: 'n1', team: 'neon', number: 1 },
      { id: 'n2', team: 'neon', number: 2, mult: 1.25 },
    ],
  });
}

describe(`${SessionEngine.name} in numbered`, () => {
  it('plays a full session: calls, pass-on, only the called member answers', () => {
    const { engine, clock } = carbonNeon();
    must(engine.start());

    // Round 0: number 2 is called (cycle [2, 3, 1]).
    const open0 = eventsOfType(must(engine.openRound()).events, 'round_opened')[0];
    expect(open0.calls).toEqual([
      { teamId: 'carbon', calledNumber: 2, playerId: 'c2' },
      { teamId: 'neon', calledNumber: 2, playerId: 'n2' },
    ]);
    expect(open0.deadlines.map((d) => [d.id, d.deadlineAt])).toEqual([
      ['carbon', T0 + 30_000],
      ['neon', T0 + 37_500],
    ]);
    clock.at(5_000);
    expect(engine.submit({ playerId: 'n1', clientMessageId: msgId(), response: pick('a') })).toMatchObject({
      ok: false,
      error: 'not_your_turn',
    });
    must(engine.submit({ playerId: 'n2', clientMessageId: msgId(), response: pick('b') }));
    clock.at(12_000);
    const closing = must(engine.submit({ playerId: 'c2', clientMessageId: msgId(), response: pick('a') }));
    expect(eventsOfType(closing.events, 'round_closed')[0].reason).toBe('all_locked');
    // carbon: c2 t = 12 s → 1000·(1 − 0.5·0.4) = 800. neon: wrong → 0.
    expect(must(engine.reveal()).results.teams.map((t) => [t.teamId, t.points, t.calledPlayerId])).toEqual([
      ['carbon', 800, 'c2'],
      ['neon', 0, 'n2'],
    ]);

    // Round 1: number 3. c3 is away → passes to the next present member, wrapping to c1;
    // neon has no #3 → wraps to n1.
    must(engine.next());
    must(engine.markAway('c3'));
    clock.at(100_000);
    const open1 = eventsOfType(must(engine.openRound()).events, 'round_opened')[0];
    expect(open1.calls).toEqual([
      { teamId: 'carbon', calledNumber: 3, playerId: 'c1' },
      { teamId: 'neon', calledNumber: 3, playerId: 'n1' },
    ]);
    clock.at(103_000);
    must(engine.submit({ playerId: 'c1', clientMessageId: msgId(), response: pick('a') }));
    clock.at(115_000);
    must(engine.submit({ playerId: 'n1', clientMessageId: msgId(), response: pick('a') }));
    // carbon: 3 s of 30 → 950. neon: 15 s of 37.5 → 1000·(1 − 0.5·0.4) = 800.
    expect(must(engine.reveal()).results.teams.map((t) => t.points)).toEqual([950, 800]);

    // Round 2: number 1 → c1 and n1; c1 drops mid-round → the call passes to c2.
    must(engine.next());
    must(engine.markBack('c3'));
    clock.at(200_000);
    must(engine.openRound());
    clock.at(201_000);
    const dropped = must(engine.markAway('c1'));
    expect(eventsOfType(dropped.events, 'call_passed')[0].call).toEqual({ teamId: 'carbon', calledNumber: 1, playerId: 'c2' });
    clock.at(224_000);
    must(engine.submit({ playerId: 'c2', clientMessageId: msgId(), response: pick('a') }));
    // neon never answers: its own deadline (37.5 s) holds the round open past carbon's 30 s.
    clock.at(230_000);
    expect(must(engine.tick()).events).toEqual([]);
    expect(engine.nextDeadline()).toBe(T0 + 237_500);
    clock.at(237_500);
    expect(eventsOfType(must(engine.tick()).events, 'round_closed')[0].reason).toBe('deadline');
    const r2 = must(engine.reveal());
    // carbon: 24 s of 30 → 1000·(1 − 0.5·0.8) = 600. neon: no answer → 0.
    expect(r2.results.teams.map((t) => t.points)).toEqual([600, 0]);
    // Totals: carbon 800 + 950 + 600 = 2350; neon 0 + 800 + 0 = 800.
    expect(eventsOfType(r2.events, 'standings')[0].entries.map((e) => [e.teamId, e.points])).toEqual([
      ['carbon', 2350],
      ['neon', 800],
    ]);
    // Per-player results hold the submissions only: one per team and round.
    expect(r2.results.players.map((p) => [p.playerId, p.points])).toEqual([['c2', 600]]);
  });

  it('leaves a team with nobody present uncalled and does not wait for it', () => {
    const { engine, clock } = carbonNeon();
    must(engine.start());
    must(engine.markAway('n1'));
    must(engine.markAway('n2'));
    const opened = eventsOfType(must(engine.openRound()).events, 'round_opened')[0];
    expect(opened.calls[1]).toEqual({ teamId: 'neon', calledNumber: 2, playerId: null });
    clock.at(2_000);
    const back = must(engine.markBack('n1'));
    // n1 returns: the call reaches them (from #2 there is nobody present, wrap to #1).
    expect(eventsOfType(back.events, 'call_passed')[0].call).toEqual({ teamId: 'neon', calledNumber: 2, playerId: 'n1' });
    must(engine.markAway('n1'));
    clock.at(4_000);
    const done = must(engine.submit({ playerId: 'c2', clientMessageId: msgId(), response: pick('a') }));
    expect(eventsOfType(done.events, 'round_closed')[0].reason).toBe('all_locked');
  });

  it('calls every number equally often over many rounds', () => {
    // Each cycle is a seeded permutation of 1..4, so over 40 rounds every number is called
    // exactly 10 times and each block of 4 rounds holds each number once (common practice:
    // shuffle-then-deal gives balanced rotation).
    const players = ['ta', 'tb', 'tc'].flatMap((team) =>
      [1, 2, 3, 4].map((number) => ({ id: `${team}${number}`, team, number })),
    );
    const { engine } = makeSession({ format: 'numbered', itemCount: 40, seed: 'rotation\u0000', players });
    must(engine.start());
    const called: number[] = [];
    for (let i = 0; i < 40; i++) {
      const opened = eventsOfType(must(engine.openRound()).events, 'round_opened')[0];
      called.push(opened.calls[0].calledNumber);
      must(engine.closeRound());
      must(engine.reveal());
      if (i < 39) must(engine.next());
    }
    const counts = [1, 2, 3, 4].map((n) => called.filter((c) => c === n).length);
    expect(counts).toEqual([10, 10, 10, 10]);
    for (let block = 0; block < 10; block++) {
      expect([...called.slice(block * 4, block * 4 + 4)].sort()).toEqual([1, 2, 3, 4]);
    }
    // Not the trivial order 1, 2, 3, 4 every time.
    expect(called.slice(0, 8)).not.toEqual([1, 2, 3, 4, 1, 2, 3, 4]);
  });
});

describe('seededShuffle', () => {
  it('matches the published seedrandom Fisher–Yates vector', () => {
    // REFERENCES.md §2: seedrandom('hello.'), [1..10] → 8,7,3,5,9,1,2,6,4,10.
    expect(seededShuffle([1, 2, 3, 4, 5, 6, 7, 8, 9, 10], seedrandom('hello.'))).toEqual([8, 7, 3, 5, 9, 1, 2, 6, 4, 10]);
  });

  it('agrees with simple-statistics shuffle given the same rng', () => {
    // Reference implementation: simple-statistics 7.12 `shuffle(arr, rng)`.
    const items = Array.from({ length: 12 }, (_, i) => i + 1);
    expect(seededShuffle(items, seedrandom('covalent\u0000'))).toEqual(shuffle(items, seedrandom('covalent\u0000')));
  });

  it('reports n − 1 rng draws per cycle', () => {
    let draws = 0;
    const counting = (): number => {
      draws += 1;
      return 0;
    };
    const { cycle, draws: reported } = drawCallCycle(5, counting);
    expect(cycle.slice().sort()).toEqual([1, 2, 3, 4, 5]);
    expect(reported).toBe(4);
    expect(draws).toBe(4);
  });
});
