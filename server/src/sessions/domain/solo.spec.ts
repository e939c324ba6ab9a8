import { mean } from 'simple-statistics';
import { SessionEngine } from './session-engine';
import { T0, eventsOfType, makeSession, msgId, must, pick } from './session-engine.factories';

// Rules: DESIGN.md §4 "Formats" (solo), "Timing", "Points", "Standings"; points worked by hand
// with points = round(1000 · c · (1 − w · t/T)), w = 0.5, T = 30 s × the player's multiplier.

function heliumLithium(standings: 'full' | 'top3' | 'none' = 'full') {
  return makeSession({
    format: 'solo',
    standings,
    players: [
      { id: 'h1', team: 'helium' },
      { id: 'h2', team: 'helium', mult: 2 },
      { id: 'l1', team: 'lithium' },
      { id: 'l2', team: 'lithium', mult: 1.5 },
    ],
  });
}

describe(`${SessionEngine.name} in solo`, () => {
  it('plays a full session with own deadlines, team means and the tie-breaks', () => {
    const { engine, clock } = heliumLithium();
    must(engine.start());
    const opened = eventsOfType(must(engine.openRound()).events, 'round_opened')[0];
    // Own deadlines: ×1 → 30 s, ×2 → 60 s, ×1.5 → 45 s.
    expect(opened.deadlines.map((d) => [d.id, d.deadlineAt - T0])).toEqual([
      ['h1', 30_000],
      ['h2', 60_000],
      ['l1', 30_000],
      ['l2', 45_000],
    ]);

    clock.at(3_000);
    must(engine.submit({ playerId: 'l1', clientMessageId: msgId(), response: pick('b') }));
    clock.at(6_000);
    must(engine.submit({ playerId: 'h1', clientMessageId: msgId(), response: pick('a') }));
    clock.at(30_000);
    must(engine.submit({ playerId: 'h2', clientMessageId: msgId(), response: pick('a') }));
    clock.at(30_001);
    // h1's own 30 s are over.
    expect(engine.submit({ playerId: 'h1', clientMessageId: msgId(), response: pick('a') })).toMatchObject({
      ok: false,
      error: 'too_late',
    });
    clock.at(45_000);
    // Exactly on the own deadline is still in time.
    const last = must(engine.submit({ playerId: 'l2', clientMessageId: msgId(), response: pick('a') }));
    expect(eventsOfType(last.events, 'round_closed')[0].reason).toBe('all_locked');

    const r0 = must(engine.reveal()).results;
    // h1: 6 s of 30 → 900.  h2: 30 s of 60 → 1000·(1 − 0.25) = 750.
    // l1: wrong → 0.        l2: 45 s of 45 → 1000·(1 − 0.5) = 500.
    expect(r0.players.map((p) => [p.playerId, p.points, p.limitMs])).toEqual([
      ['h1', 900, 30_000],
      ['h2', 750, 60_000],
      ['l1', 0, 30_000],
      ['l2', 500, 45_000],
    ]);
    // Team round points: helium (900 + 750)/2 = 825; lithium (0 + 500)/2 = 250.
    expect(r0.teams.map((t) => [t.teamId, t.points])).toEqual([
      ['helium', 825],
      ['lithium', 250],
    ]);

    must(engine.next());
    clock.at(100_000);
    must(engine.openRound());
    must(engine.submit({ playerId: 'l1', clientMessageId: msgId(), response: pick('a') }));
    clock.at(109_000);
    must(engine.submit({ playerId: 'l2', clientMessageId: msgId(), response: pick('a') }));
    clock.at(115_000);
    must(engine.submit({ playerId: 'h1', clientMessageId: msgId(), response: pick('a') }));
    // h2 (×2) does not answer: the round waits for h2's own 60 s.
    expect(engine.nextDeadline()).toBe(T0 + 160_000);
    clock.at(160_000);
    must(engine.tick());
    const revealed = must(engine.reveal());
    // h1: 15 s of 30 → 750; h2: no answer → 0; l1: 0 s → 1000; l2: 9 s of 45 → 900.
    expect(revealed.results.players.map((p) => p.points)).toEqual([750, 0, 1000, 900]);

    // Team totals = mean of members' totals: helium mean(900+750, 750+0) = mean(1650, 750) = 1200;
    // lithium mean(0+1000, 500+900) = mean(1000, 1400) = 1200 → tie on points (cross-checked with simple-statistics mean).
    expect(mean([1650, 750])).toBe(1200);
    expect(mean([1000, 1400])).toBe(1200);
    // Correct answers: helium 2/2 + 1/2 = 1.5; lithium 1/2 + 2/2 = 1.5 → tie again.
    // Response time (a missing answer counts the player's whole limit, so silence never wins a tie):
    // helium (6 + 30)/2 + (15 + 60)/2 = 18 + 37.5 = 55.5 s; lithium (3 + 45)/2 + (0 + 9)/2 = 24 + 4.5 = 28.5 s.
    // → lithium first (DESIGN.md §4: then lower total response time).
    const entries = eventsOfType(revealed.events, 'standings')[0].entries;
    expect(entries).toEqual([
      { teamId: 'lithium', name: 'lithium', rank: 1, points: 1200, correctAnswers: 1.5, responseMs: 28_500 },
      { teamId: 'helium', name: 'helium', rank: 2, points: 1200, correctAnswers: 1.5, responseMs: 55_500 },
    ]);
    expect(engine.playerStanding('h2')).toEqual({ teamId: 'helium', rank: 2, points: 1200, teamCount: 2 });
  });

  it('gives a late joiner the next round, not the open one', () => {
    const { engine } = heliumLithium();
    must(engine.start());
    must(engine.openRound());
    must(engine.addPlayer({ id: 'late', teamId: 'lithium' }));
    expect(engine.submit({ playerId: 'late', clientMessageId: msgId(), response: pick('a') })).toMatchObject({
      ok: false,
      error: 'round_not_open',
    });
    must(engine.closeRound());
    must(engine.reveal());
    must(engine.next());
    must(engine.openRound());
    expect(engine.deadlineFor('late')).toMatchObject({ kind: 'player', id: 'late', limitMs: 30_000 });
    must(engine.submit({ playerId: 'late', clientMessageId: msgId(), response: pick('a') }));
  });

  it('refuses an answer from a removed player', () => {
    const { engine } = heliumLithium();
    must(engine.start());
    must(engine.openRound());
    must(engine.removePlayer('h1'));
    expect(engine.submit({ playerId: 'h1', clientMessageId: msgId(), response: pick('a') })).toMatchObject({
      ok: false,
      error: 'removed',
    });
  });

  it('does not wait for away players once everyone present has answered', () => {
    const { engine } = heliumLithium();
    must(engine.start());
    must(engine.openRound());
    must(engine.markAway('h2'));
    must(engine.submit({ playerId: 'h1', clientMessageId: msgId(), response: pick('a') }));
    must(engine.submit({ playerId: 'l1', clientMessageId: msgId(), response: pick('a') }));
    const last = must(engine.submit({ playerId: 'l2', clientMessageId: msgId(), response: pick('a') }));
    expect(eventsOfType(last.events, 'round_closed')[0].reason).toBe('all_locked');
  });
});

describe('standings views', () => {
  function playOneRound(standings: 'full' | 'top3' | 'none') {
    // Four one-player teams answering at 0, 3, 6, 9 s → 1000, 950, 900, 850.
    const s = makeSession({
      format: 'solo',
      standings,
      players: ['ta', 'tb', 'tc', 'td'].map((team) => ({ id: `${team}-p`, team })),
    });
    must(s.engine.start());
    must(s.engine.openRound());
    ['ta', 'tb', 'tc', 'td'].forEach((team, i) => {
      s.clock.at(i * 3_000);
      must(s.engine.submit({ playerId: `${team}-p`, clientMessageId: msgId(), response: pick('a') }));
    });
    return { ...s, revealed: must(s.engine.reveal()) };
  }

  it('shows the class every team with full standings', () => {
    const { revealed } = playOneRound('full');
    expect(eventsOfType(revealed.events, 'standings')[0].entries.map((e) => e.points)).toEqual([1000, 950, 900, 850]);
  });

  it('shows the class the top three only', () => {
    const { revealed, engine } = playOneRound('top3');
    expect(eventsOfType(revealed.events, 'standings')[0].entries.map((e) => e.teamId)).toEqual(['ta', 'tb', 'tc']);
    // The fourth team still gets its own standing.
    expect(engine.teamStanding('td')).toEqual({ teamId: 'td', rank: 4, points: 850, teamCount: 4 });
    expect(eventsOfType(revealed.events, 'team_standing').find((e) => e.standing.teamId === 'td')?.audience).toEqual({
      kind: 'team',
      teamId: 'td',
    });
  });

  it('shows the class nothing with none, while each team still sees its own', () => {
    const { revealed } = playOneRound('none');
    expect(eventsOfType(revealed.events, 'standings')[0].entries).toEqual([]);
    expect(eventsOfType(revealed.events, 'team_standing')).toHaveLength(4);
  });
});
