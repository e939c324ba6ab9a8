import { SessionEngine } from './session-engine';
import { T0, eventsOfType, makeSession, msgId, must, pick } from './session-engine.factories';

// Rules: DESIGN.md §4 "Timing" (server-owned deadlines, pause/resume, add 15 s, close early,
// time multipliers) and "Points" (T is the own extended limit), worked by hand.

function soloOf(...mults: number[]) {
  return makeSession({
    format: 'solo',
    players: mults.map((mult, i) => ({ id: `p${i + 1}`, team: 'xenon', mult })),
  });
}

describe(`${SessionEngine.name} timing`, () => {
  it('extends each solo deadline by the own time multiplier', () => {
    const { engine } = soloOf(1, 1.25, 1.5, 2);
    must(engine.start());
    const opened = eventsOfType(must(engine.openRound()).events, 'round_opened')[0];
    // 30 s × 1, 1.25, 1.5, 2 = 30, 37.5, 45, 60 s.
    expect(opened.deadlines.map((d) => d.deadlineAt - T0)).toEqual([30_000, 37_500, 45_000, 60_000]);
  });

  it('gives a team the deadline of its largest multiplier', () => {
    const { engine } = makeSession({
      format: 'huddle',
      players: [
        { id: 'k1', team: 'krypton' },
        { id: 'k2', team: 'krypton', mult: 1.25 },
        { id: 'k3', team: 'krypton', mult: 2 },
        { id: 's1', team: 'sodium' },
      ],
    });
    must(engine.start());
    const opened = eventsOfType(must(engine.openRound()).events, 'round_opened')[0];
    expect(opened.deadlines.map((d) => [d.id, d.deadlineAt - T0])).toEqual([
      ['krypton', 60_000],
      ['sodium', 30_000],
    ]);
    expect(engine.deadlineFor('k1')?.deadlineAt).toBe(T0 + 60_000);
  });

  it('shifts deadlines by the paused time and leaves it out of the elapsed time', () => {
    const { engine, clock } = soloOf(1);
    must(engine.start());
    must(engine.openRound());
    clock.at(10_000);
    must(engine.pause());
    expect(engine.nextDeadline()).toBeNull();
    clock.at(12_000);
    expect(engine.submit({ playerId: 'p1', clientMessageId: msgId(), response: pick('a') })).toMatchObject({
      ok: false,
      error: 'session_paused',
    });
    clock.at(25_000);
    const resumed = eventsOfType(must(engine.resume()).events, 'session_resumed')[0];
    // Paused 10 s → 25 s = 15 s; deadline 30 s + 15 s = 45 s.
    expect(resumed.pausedMs).toBe(15_000);
    expect(resumed.deadlines[0].deadlineAt).toBe(T0 + 45_000);
    expect(engine.nextDeadline()).toBe(T0 + 45_000);
    clock.at(40_000);
    must(engine.submit({ playerId: 'p1', clientMessageId: msgId(), response: pick('a') }));
    // Elapsed = 40 s − 15 s paused = 25 s → 1000·(1 − 0.5·25/30) = 583.33 → 583.
    expect(engine.roundResults(0)?.players[0]).toMatchObject({ elapsedMs: 25_000, points: 583 });
  });

  it('adds 15 s to every deadline and to T', () => {
    const { engine, clock } = soloOf(1, 2);
    must(engine.start());
    must(engine.openRound());
    clock.at(20_000);
    const added = eventsOfType(must(engine.addTime()).events, 'time_added')[0];
    // 30 + 15 = 45 s; 60 + 15 = 75 s.
    expect(added.deadlines.map((d) => [d.deadlineAt - T0, d.limitMs])).toEqual([
      [45_000, 45_000],
      [75_000, 75_000],
    ]);
    clock.at(40_000);
    // Would be too late without the extra time.
    must(engine.submit({ playerId: 'p1', clientMessageId: msgId(), response: pick('a') }));
    must(engine.closeRound());
    // t = 40 s of T = 45 s: 1000·(1 − 0.5·40/45) = 555.56 → 556.
    expect(engine.roundResults(0)?.players[0]).toMatchObject({ points: 556, limitMs: 45_000 });
  });

  it('refuses an answer after the own deadline and accepts one on it', () => {
    // p3 (×2) keeps the round open past the 30 s deadline of p1 and p2.
    const { engine, clock } = soloOf(1, 1, 2);
    must(engine.start());
    must(engine.openRound());
    clock.at(30_000);
    must(engine.submit({ playerId: 'p1', clientMessageId: msgId(), response: pick('a') }));
    clock.at(30_001);
    expect(engine.submit({ playerId: 'p2', clientMessageId: msgId(), response: pick('a') })).toMatchObject({
      ok: false,
      error: 'too_late',
    });
    // `at` is the receipt time: a message received at 59 s but processed at 61 s still counts.
    clock.at(61_000);
    const late = must(engine.submit({ playerId: 'p3', clientMessageId: msgId(), response: pick('a'), at: T0 + 59_000 }));
    expect(eventsOfType(late.events, 'round_closed')[0].reason).toBe('deadline');
    expect(engine.roundResults(0)?.players.map((p) => p.answered)).toEqual([true, false, true]);
  });

  it('refuses an answer received before the round opened', () => {
    const { engine, clock } = soloOf(1);
    must(engine.start());
    clock.at(5_000);
    must(engine.openRound());
    expect(engine.submit({ playerId: 'p1', clientMessageId: msgId(), response: pick('a'), at: T0 + 4_000 })).toMatchObject({
      ok: false,
      error: 'round_not_open',
    });
  });

  it('closes the round at the last deadline on tick, not before', () => {
    const { engine, clock } = soloOf(1);
    must(engine.start());
    must(engine.openRound());
    expect(engine.nextDeadline()).toBe(T0 + 30_000);
    clock.at(29_999);
    expect(must(engine.tick()).events).toEqual([]);
    clock.at(30_000);
    const closed = eventsOfType(must(engine.tick()).events, 'round_closed')[0];
    expect(closed).toMatchObject({ reason: 'deadline', closedAt: T0 + 30_000 });
    expect(engine.roundResults(0)?.players[0]).toMatchObject({ answered: false, points: 0 });
  });

  it('lets the host close early, after which answers are refused', () => {
    const { engine, clock } = soloOf(1, 1);
    must(engine.start());
    must(engine.openRound());
    clock.at(5_000);
    must(engine.submit({ playerId: 'p1', clientMessageId: msgId(), response: pick('a') }));
    const closed = eventsOfType(must(engine.closeRound()).events, 'round_closed')[0];
    expect(closed).toMatchObject({ reason: 'host', closedAt: T0 + 5_000 });
    expect(engine.submit({ playerId: 'p2', clientMessageId: msgId(), response: pick('a') })).toMatchObject({
      ok: false,
      error: 'round_not_open',
    });
    expect(engine.nextDeadline()).toBeNull();
  });
});

describe(`${SessionEngine.name} resends`, () => {
  it('counts a resent solo answer once and returns the first acceptance', () => {
    const { engine, clock } = soloOf(1, 1);
    must(engine.start());
    must(engine.openRound());
    clock.at(4_000);
    const first = must(engine.submit({ playerId: 'p1', clientMessageId: 'same', response: pick('a') }));
    clock.at(9_000);
    const again = must(engine.submit({ playerId: 'p1', clientMessageId: 'same', response: pick('b') }));
    expect(again.duplicate).toBe(true);
    expect(again.acceptance).toEqual(first.acceptance);
    expect(again.events).toEqual([]);
    expect(engine.currentRound()?.answers).toHaveLength(1);
    must(engine.closeRound());
    // Still a resend after the close: acknowledged, not refused.
    expect(must(engine.submit({ playerId: 'p1', clientMessageId: 'same', response: pick('a') })).duplicate).toBe(true);
    // 4 s of 30 → 1000·(1 − 0.5·4/30) = 933.33 → 933, from the first send only.
    expect(engine.roundResults(0)?.players[0]).toMatchObject({ points: 933, response: pick('a') });
  });

  it('does not let an old huddle vote come back through a resend', () => {
    const { engine } = makeSession({ format: 'huddle', players: [{ id: 'v1', team: 'iron' }] });
    must(engine.start());
    must(engine.openRound());
    must(engine.submit({ playerId: 'v1', clientMessageId: 'vote-1', response: pick('b') }));
    must(engine.submit({ playerId: 'v1', clientMessageId: 'vote-2', response: pick('a') }));
    expect(must(engine.submit({ playerId: 'v1', clientMessageId: 'vote-1', response: pick('b') })).duplicate).toBe(true);
    expect(engine.teamVotes('iron')).toEqual([{ playerId: 'v1', response: pick('a'), locked: false }]);
  });

  it('scopes message ids per player', () => {
    const { engine } = soloOf(1, 1);
    must(engine.start());
    must(engine.openRound());
    must(engine.submit({ playerId: 'p1', clientMessageId: 'x', response: pick('a') }));
    expect(must(engine.submit({ playerId: 'p2', clientMessageId: 'x', response: pick('a') })).duplicate).toBe(false);
  });
});

describe(`${SessionEngine.name} standings ties`, () => {
  it('gives teams equal on points, correct answers and time the same rank, listed by id', () => {
    // Three one-player teams: two answer at 3 s (950 each), one at 0 s (1000).
    const { engine, clock } = makeSession({
      format: 'solo',
      players: [
        { id: 'z', team: 'zinc' },
        { id: 'g', team: 'gold' },
        { id: 'c', team: 'cobalt' },
      ],
    });
    must(engine.start());
    must(engine.openRound());
    must(engine.submit({ playerId: 'c', clientMessageId: msgId(), response: pick('a') }));
    clock.at(3_000);
    must(engine.submit({ playerId: 'z', clientMessageId: msgId(), response: pick('a') }));
    must(engine.submit({ playerId: 'g', clientMessageId: msgId(), response: pick('a') }));
    must(engine.reveal());
    expect(engine.standings().map((e) => [e.teamId, e.rank, e.points])).toEqual([
      ['cobalt', 1, 1000],
      ['gold', 2, 950],
      ['zinc', 2, 950],
    ]);
  });
});
