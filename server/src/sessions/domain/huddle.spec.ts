import { SessionEngine } from './session-engine';
import { pluralityChoice } from './huddle-vote';
import { canonicalJson } from './canonical-json';
import { T0, eventsOfType, makeSession, msgId, must, pick } from './session-engine.factories';
import type { VoteLogEntry } from './types';

// Rules: DESIGN.md §4 "Formats" (huddle) and "Points"; points worked by hand with
// points = round(1000 · c · (1 − w · t/T)), w = 0.5, unity bonus 10 %.

describe(`${SessionEngine.name} in huddle`, () => {
  function argonBoron() {
    // argon: three members, all ×1 → T = 30 s. boron: b2 has ×1.5 → team T = 45 s (largest multiplier).
    return makeSession({
      format: 'huddle',
      keys: ['a', 'c'],
      players: [
        { id: 'a1', team: 'argon' },
        { id: 'a2', team: 'argon' },
        { id: 'a3', team: 'argon' },
        { id: 'b1', team: 'boron' },
        { id: 'b2', team: 'boron', mult: 1.5 },
      ],
    });
  }

  it('plays a full session with team means, the unity bonus and standings', () => {
    const { engine, clock } = argonBoron();
    must(engine.start());
    const opened = must(engine.openRound());
    const deadlines = eventsOfType(opened.events, 'round_opened')[0].deadlines;
    expect(deadlines).toEqual([
      { kind: 'team', id: 'argon', deadlineAt: T0 + 30_000, limitMs: 30_000 },
      { kind: 'team', id: 'boron', deadlineAt: T0 + 45_000, limitMs: 45_000 },
    ]);

    // Round 0, key 'a'.
    clock.at(3_000);
    must(engine.submit({ playerId: 'a1', clientMessageId: msgId(), response: pick('a'), lock: true }));
    clock.at(4_000);
    const a2first = must(engine.submit({ playerId: 'a2', clientMessageId: msgId(), response: pick('b') }));
    const seen = eventsOfType(a2first.events, 'votes_changed');
    expect(seen).toHaveLength(1);
    // Teammates see each other's current votes; the event is addressed to that team only.
    expect(seen[0].audience).toEqual({ kind: 'team', teamId: 'argon' });
    expect(seen[0].votes).toEqual([
      { playerId: 'a1', response: pick('a'), locked: true },
      { playerId: 'a2', response: pick('b'), locked: false },
    ]);
    clock.at(5_000);
    must(engine.submit({ playerId: 'a3', clientMessageId: msgId(), response: pick('a'), lock: true }));
    clock.at(6_000);
    must(engine.submit({ playerId: 'a2', clientMessageId: msgId(), response: pick('a') }));
    clock.at(7_000);
    must(engine.lockIn({ playerId: 'a2' }));
    clock.at(9_000);
    must(engine.submit({ playerId: 'b1', clientMessageId: msgId(), response: pick('b'), lock: true }));
    clock.at(18_000);
    const last = must(engine.submit({ playerId: 'b2', clientMessageId: msgId(), response: pick('a'), lock: true }));
    // Everyone locked in → the round closes at once.
    expect(eventsOfType(last.events, 'round_closed')[0]).toMatchObject({ reason: 'all_locked', closedAt: T0 + 18_000 });

    const r0 = must(engine.reveal()).results;
    // argon: a1 t=3 s → 1000·(1 − 0.5·3/30) = 950; a2 last change at 6 s → 900 (locking at 7 s is no change);
    //        a3 t=5 s → 1000·(1 − 1/12) = 916.67 → 917. Mean 2767/3 = 922.33; all correct → ×1.1 = 1014.57 → 1015.
    // boron (T = 45 s): b1 wrong → 0; b2 t=18 s → 1000·(1 − 0.5·0.4) = 800. Mean 400, no bonus.
    //        Team answer: 'b' and 'a' both have 1 vote; 'b' reached 1 first (9 s) → 'b'.
    expect(r0.players.map((p) => [p.playerId, p.points, p.elapsedMs])).toEqual([
      ['a1', 950, 3_000],
      ['a2', 900, 6_000],
      ['a3', 917, 5_000],
      ['b1', 0, 9_000],
      ['b2', 800, 18_000],
    ]);
    expect(r0.teams.map((t) => [t.teamId, t.points, t.unity, t.answer, t.correct])).toEqual([
      ['argon', 1015, true, pick('a'), true],
      ['boron', 400, false, pick('b'), false],
    ]);

    must(engine.next());
    clock.at(100_000);
    must(engine.openRound());
    // Round 1, key 'c'. a3 never votes; argon's votes stay unlocked.
    clock.at(102_000);
    must(engine.submit({ playerId: 'a1', clientMessageId: msgId(), response: pick('c') }));
    clock.at(104_000);
    must(engine.submit({ playerId: 'a2', clientMessageId: msgId(), response: pick('d') }));
    clock.at(110_000);
    must(engine.submit({ playerId: 'b1', clientMessageId: msgId(), response: pick('c'), lock: true }));
    clock.at(120_000);
    const boronDone = must(engine.submit({ playerId: 'b2', clientMessageId: msgId(), response: pick('c'), lock: true }));
    expect(eventsOfType(boronDone.events, 'round_closed')).toHaveLength(0);
    // argon still has time until 100 s + 30 s.
    expect(engine.nextDeadline()).toBe(T0 + 130_000);
    clock.at(129_999);
    expect(must(engine.tick()).events).toEqual([]);
    clock.at(130_000);
    expect(eventsOfType(must(engine.tick()).events, 'round_closed')).toHaveLength(1);

    const revealed = must(engine.reveal());
    // argon: a1 'c' at 2 s → 1000·(1 − 1/30) = 966.67 → 967; a2 wrong → 0; a3 did not vote → 0.
    //        Mean 967/3 = 322.33 → 322. Team answer: 'c' (1 vote at 2 s) beats 'd' (1 vote at 4 s).
    // boron: b1 10 s of 45 → 1000·(1 − 0.5·10/45) = 888.89 → 889; b2 20 s → 777.78 → 778;
    //        both correct → mean 833.5 · 1.1 = 916.85 → 917.
    expect(revealed.results.teams.map((t) => [t.teamId, t.points, t.unity, t.answer])).toEqual([
      ['argon', 322, false, pick('c')],
      ['boron', 917, true, pick('c')],
    ]);
    expect(revealed.results.players.find((p) => p.playerId === 'a3')).toMatchObject({ answered: false, points: 0 });
    // Totals: argon 1015 + 322 = 1337; boron 400 + 917 = 1317.
    const standings = eventsOfType(revealed.events, 'standings')[0];
    expect(standings.entries.map((e) => [e.teamId, e.rank, e.points])).toEqual([
      ['argon', 1, 1337],
      ['boron', 2, 1317],
    ]);
    expect(eventsOfType(revealed.events, 'team_standing').map((e) => e.standing)).toEqual([
      { teamId: 'argon', rank: 1, points: 1337, teamCount: 2 },
      { teamId: 'boron', rank: 2, points: 1317, teamCount: 2 },
    ]);
    expect(engine.next()).toMatchObject({ ok: false, error: 'no_more_items' });
    must(engine.end());
    expect(engine.status).toBe('ended');
  });

  it('refuses a vote change after lock-in', () => {
    const { engine } = argonBoron();
    must(engine.start());
    must(engine.openRound());
    must(engine.submit({ playerId: 'a1', clientMessageId: msgId(), response: pick('a'), lock: true }));
    expect(engine.submit({ playerId: 'a1', clientMessageId: msgId(), response: pick('b') })).toMatchObject({
      ok: false,
      error: 'already_locked',
    });
  });

  it('treats responses with the same canonical JSON as one choice', () => {
    const { engine, clock } = argonBoron();
    must(engine.start());
    must(engine.openRound());
    clock.at(2_000);
    must(engine.submit({ playerId: 'a1', clientMessageId: msgId(), response: { type: 'single', optionId: 'a' } }));
    clock.at(8_000);
    // Same choice with keys in another order: no change, so the elapsed time stays 2 s.
    must(engine.submit({ playerId: 'a1', clientMessageId: msgId(), response: { optionId: 'a', type: 'single' } }));
    must(engine.closeRound());
    const a1 = engine.roundResults(0)?.players.find((p) => p.playerId === 'a1');
    // 1000 · (1 − 0.5 · 2/30) = 966.67 → 967
    expect(a1).toMatchObject({ elapsedMs: 2_000, points: 967 });
  });

  it('drops a removed member from the team mean', () => {
    const { engine, clock } = argonBoron();
    must(engine.start());
    must(engine.openRound());
    clock.at(6_000);
    must(engine.submit({ playerId: 'b1', clientMessageId: msgId(), response: pick('a'), lock: true }));
    must(engine.removePlayer('b2'));
    const closed = must(engine.closeRound());
    expect(eventsOfType(closed.events, 'round_closed')).toHaveLength(1);
    // boron is now b1 alone (T stays 45 s, fixed at opening): 1000·(1 − 0.5·6/45) = 933.33 → 933;
    // every (one) member correct → 933 · 1.1 = 1026.3 → 1026. Member points are rounded before the mean.
    expect(engine.roundResults(0)?.teams.find((t) => t.teamId === 'boron')).toMatchObject({
      points: 1026,
      unity: true,
      memberCount: 1,
    });
  });
});

describe('pluralityChoice', () => {
  const x = canonicalJson(pick('x'));
  const y = canonicalJson(pick('y'));
  const z = canonicalJson(pick('z'));
  let seq = 0;
  const vote = (playerId: string, from: string | null, to: string): VoteLogEntry => ({
    seq: ++seq,
    teamId: 't',
    playerId,
    from,
    to,
    at: seq,
  });

  it('returns null when nobody voted', () => {
    expect(pluralityChoice([])).toBeNull();
  });

  it('picks the choice with most votes', () => {
    expect(pluralityChoice([vote('p1', null, x), vote('p2', null, y), vote('p3', null, y)])).toBe(y);
  });

  it('breaks a tie on the choice that reached the count first', () => {
    // y reaches 2 at the 3rd vote, x only at the 4th.
    expect(pluralityChoice([vote('p1', null, x), vote('p2', null, y), vote('p3', null, y), vote('p4', null, x)])).toBe(y);
  });

  it('restarts the clock when a choice loses a vote and gets it back', () => {
    // x reaches 2 (2nd vote), y reaches 2 (4th); p1 leaves x for z and returns (6th) → x re-reached 2 after y.
    const log = [
      vote('p1', null, x),
      vote('p2', null, x),
      vote('p3', null, y),
      vote('p4', null, y),
      vote('p1', x, z),
      vote('p1', z, x),
    ];
    expect(pluralityChoice(log)).toBe(y);
  });

  it('keeps the earlier time when a choice rose above the count and fell back', () => {
    // x: 1 at #1, 2 at #2 ; y: 1 at #3, 2 at #4 ; p5 joins x (3) then leaves for z → x back to 2,
    // held since #2, so x still came first among the 2-vote choices.
    const log = [
      vote('p1', null, x),
      vote('p2', null, x),
      vote('p3', null, y),
      vote('p4', null, y),
      vote('p5', null, x),
      vote('p5', x, z),
    ];
    expect(pluralityChoice(log)).toBe(x);
  });
});
