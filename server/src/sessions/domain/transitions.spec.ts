import { SessionEngine } from './session-engine';
import { makeDeps, makeSession, msgId, must, pick } from './session-engine.factories';

// Session states lobby → running ⇄ paused → ended; round states ready → open → closed → revealed
// (DESIGN.md §3). Illegal moves return { ok: false, error, message } and change nothing.

function solo() {
  return makeSession({ format: 'solo', itemCount: 1, players: [{ id: 'p1', team: 'tin' }] });
}

function expectError(result: { ok: boolean }, error: string): void {
  expect(result).toEqual({ ok: false, error, message: expect.any(String) });
}

describe(`${SessionEngine.name} transitions`, () => {
  it('refuses round commands in the lobby', () => {
    const { engine } = solo();
    expectError(engine.openRound(), 'session_not_running');
    expectError(engine.pause(), 'session_not_running');
    expectError(engine.reveal(), 'session_not_running');
    expectError(engine.closeRound(), 'round_not_open');
    expectError(engine.submit({ playerId: 'p1', clientMessageId: msgId(), response: pick('a') }), 'round_not_open');
    expect(engine.status).toBe('lobby');
  });

  it('refuses a second start', () => {
    const { engine } = solo();
    must(engine.start());
    expectError(engine.start(), 'not_in_lobby');
  });

  it('follows ready → open → closed → revealed and refuses skips', () => {
    const { engine } = solo();
    must(engine.start());
    expectError(engine.reveal(), 'round_not_closed');
    expectError(engine.next(), 'round_not_revealed');
    expectError(engine.closeRound(), 'round_not_open');
    must(engine.openRound());
    expectError(engine.openRound(), 'round_not_ready');
    expectError(engine.reveal(), 'round_not_closed');
    must(engine.closeRound());
    expectError(engine.closeRound(), 'round_not_open');
    expectError(engine.addTime(), 'round_not_open');
    expectError(engine.next(), 'round_not_revealed');
    must(engine.reveal());
    expectError(engine.reveal(), 'round_not_closed');
    expectError(engine.next(), 'no_more_items');
    expect(engine.currentRound()?.status).toBe('revealed');
  });

  it('refuses to resume when running and to pause twice', () => {
    const { engine } = solo();
    must(engine.start());
    expectError(engine.resume(), 'not_paused');
    must(engine.pause());
    expectError(engine.pause(), 'session_paused');
    expectError(engine.openRound(), 'session_paused');
    must(engine.resume());
    expect(engine.status).toBe('running');
  });

  it('refuses everything but reads after the end', () => {
    const { engine } = solo();
    must(engine.start());
    must(engine.openRound());
    const ended = must(engine.end());
    expect(ended.events.map((e) => e.type)).toEqual(['round_closed', 'session_ended', 'standings', 'team_standing']);
    for (const result of [
      engine.end(),
      engine.openRound(),
      engine.pause(),
      engine.closeRound(),
      engine.addTime(),
      engine.addPlayer({ id: 'p9', teamId: 'tin' }),
      engine.submit({ playerId: 'p1', clientMessageId: msgId(), response: pick('a') }),
    ]) {
      expectError(result, 'session_ended');
    }
    // The closed round's results are kept for the debrief.
    expect(engine.roundResults(0)?.players).toHaveLength(1);
  });

  it('refuses bad roster input', () => {
    const { engine } = solo();
    expectError(engine.addPlayer({ id: 'p1', teamId: 'tin' }), 'duplicate_player');
    expectError(engine.addPlayer({ id: 'p2', teamId: 'lead' }), 'unknown_team');
    expectError(engine.addPlayer({ id: 'p2', teamId: 'tin', timeMultiplier: 3 }), 'invalid_multiplier');
    expectError(engine.addPlayer({ id: 'p2', teamId: 'tin', number: 1 }), 'duplicate_number');
    expectError(engine.addPlayer({ id: 'p2', teamId: 'tin', number: 0 }), 'invalid_number');
    expectError(engine.addTeam({ id: 'tin' }), 'duplicate_team');
    expect(must(engine.addPlayer({ id: 'p2', teamId: 'tin' })).player.number).toBe(2);
    expectError(engine.markAway('ghost'), 'unknown_player');
    must(engine.removePlayer('p2'));
    expectError(engine.markBack('p2'), 'removed');
  });

  it('refuses an invalid configuration', () => {
    const created = SessionEngine.create(
      { config: { format: 'solo', items: [], speedWeight: 2, roundLimitMs: 0 } },
      makeDeps({}),
    );
    expect(created).toMatchObject({ ok: false, error: 'invalid_config' });
    if (!created.ok) {
      expect(created.message).toContain('at least one item');
      expect(created.message).toContain('speedWeight');
      expect(created.message).toContain('roundLimitMs');
    }
  });

  it('refuses answers without a message id, from strangers and twice in solo', () => {
    const { engine } = solo();
    must(engine.start());
    must(engine.openRound());
    expectError(engine.submit({ playerId: 'p1', clientMessageId: '', response: pick('a') }), 'invalid_message_id');
    expectError(engine.submit({ playerId: 'nobody', clientMessageId: msgId(), response: pick('a') }), 'unknown_player');
    must(engine.submit({ playerId: 'p1', clientMessageId: msgId(), response: pick('a') }));
  });

  it('refuses a second answer in solo with a new message id', () => {
    const s = makeSession({ format: 'solo', players: [{ id: 'p1', team: 'tin' }, { id: 'p2', team: 'tin' }] });
    must(s.engine.start());
    must(s.engine.openRound());
    must(s.engine.submit({ playerId: 'p1', clientMessageId: msgId(), response: pick('a') }));
    expectError(s.engine.submit({ playerId: 'p1', clientMessageId: msgId(), response: pick('b') }), 'already_answered');
    expectError(s.engine.lockIn({ playerId: 'p2' }), 'nothing_to_lock');
  });
});
