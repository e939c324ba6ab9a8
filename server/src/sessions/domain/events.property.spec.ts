import fc from 'fast-check';
import { SessionEngine } from './session-engine';
import { makeSession, must, pick } from './session-engine.factories';
import { FORMATS, TIME_MULTIPLIERS, type EngineEvent } from './types';

// DESIGN.md §7 "Players never receive an answer key before the round is revealed": over random
// command sequences, only `round_revealed` may carry correctness; only it and the standings
// (built from revealed rounds) may carry points.

const NEVER_BEFORE_REVEAL = new Set(['correct', 'credit', 'key', 'answerKey', 'exactPoints', 'correctShare', 'unity']);
const POINTS_EVENTS = new Set<EngineEvent['type']>(['round_revealed', 'standings', 'team_standing']);

/** Every property name anywhere inside a value. */
function fieldNames(value: unknown, into = new Set<string>()): Set<string> {
  if (Array.isArray(value)) value.forEach((v) => fieldNames(v, into));
  else if (value !== null && typeof value === 'object') {
    for (const [k, v] of Object.entries(value)) {
      into.add(k);
      fieldNames(v, into);
    }
  }
  return into;
}

type Command =
  | { kind: 'submit'; player: number; option: string; lock: boolean; advance: number }
  | { kind: 'resend'; back: number }
  | { kind: 'lockIn'; player: number }
  | { kind: 'away' | 'back' | 'remove'; player: number }
  | { kind: 'join'; team: number }
  | { kind: 'open' | 'close' | 'reveal' | 'next' | 'pause' | 'resume' | 'addTime' | 'end' }
  | { kind: 'tick'; advance: number };

const playerIndex = fc.integer({ min: 0, max: 7 });
const command: fc.Arbitrary<Command> = fc.oneof(
  { weight: 6, arbitrary: fc.record({ kind: fc.constant('submit' as const), player: playerIndex, option: fc.constantFrom('a', 'b', 'c'), lock: fc.boolean(), advance: fc.integer({ min: 0, max: 20_000 }) }) },
  { weight: 1, arbitrary: fc.record({ kind: fc.constant('resend' as const), back: fc.integer({ min: 0, max: 5 }) }) },
  { weight: 1, arbitrary: fc.record({ kind: fc.constant('lockIn' as const), player: playerIndex }) },
  { weight: 1, arbitrary: fc.record({ kind: fc.constantFrom('away' as const, 'back' as const, 'remove' as const), player: playerIndex }) },
  { weight: 1, arbitrary: fc.record({ kind: fc.constant('join' as const), team: fc.integer({ min: 0, max: 2 }) }) },
  { weight: 4, arbitrary: fc.record({ kind: fc.constantFrom('open' as const, 'close' as const, 'reveal' as const, 'next' as const) }) },
  { weight: 1, arbitrary: fc.record({ kind: fc.constantFrom('pause' as const, 'resume' as const, 'addTime' as const, 'end' as const) }) },
  { weight: 2, arbitrary: fc.record({ kind: fc.constant('tick' as const), advance: fc.integer({ min: 0, max: 40_000 }) }) },
);

describe(`${SessionEngine.name} events`, () => {
  it('carry no correctness, credit or key before the reveal, whatever the commands', () => {
    const seen = new Map<string, number>();
    fc.assert(
      fc.property(
        fc.constantFrom(...FORMATS),
        fc.array(fc.record({ team: fc.integer({ min: 0, max: 2 }), mult: fc.constantFrom(...TIME_MULTIPLIERS) }), {
          minLength: 1,
          maxLength: 6,
        }),
        fc.array(command, { maxLength: 60 }),
        (format, roster, commands) => {
          const { engine, clock } = makeSession({
            format,
            itemCount: 3,
            players: roster.map((p, i) => ({ id: `p${i}`, team: `t${p.team}`, mult: p.mult })),
          });
          const ids = roster.map((_, i) => `p${i}`);
          const sent: { playerId: string; clientMessageId: string; option: string }[] = [];
          const events: EngineEvent[] = [...must(engine.start()).events];
          let joined = 0;
          for (const cmd of commands) {
            const id = (n: number) => ids[n % ids.length];
            let result: { ok: boolean; events?: EngineEvent[] };
            switch (cmd.kind) {
              case 'submit': {
                clock.advance(cmd.advance);
                const msg = { playerId: id(cmd.player), clientMessageId: `c${sent.length}`, option: cmd.option };
                sent.push(msg);
                result = engine.submit({ ...msg, response: pick(cmd.option), lock: cmd.lock });
                break;
              }
              case 'resend': {
                const msg = sent[sent.length - 1 - cmd.back];
                result = msg ? engine.submit({ ...msg, response: pick(msg.option) }) : { ok: true };
                break;
              }
              case 'lockIn':
                result = engine.lockIn({ playerId: id(cmd.player) });
                break;
              case 'away':
                result = engine.markAway(id(cmd.player));
                break;
              case 'back':
                result = engine.markBack(id(cmd.player));
                break;
              case 'remove':
                result = engine.removePlayer(id(cmd.player));
                break;
              case 'join':
                joined += 1;
                ids.push(`late${joined}`);
                result = engine.addPlayer({ id: `late${joined}`, teamId: `t${cmd.team}` });
                break;
              case 'tick':
                clock.advance(cmd.advance);
                result = engine.tick();
                break;
              case 'open':
                result = engine.openRound();
                break;
              case 'close':
                result = engine.closeRound();
                break;
              case 'reveal':
                result = engine.reveal();
                break;
              case 'next':
                result = engine.next();
                break;
              case 'pause':
                result = engine.pause();
                break;
              case 'resume':
                result = engine.resume();
                break;
              case 'addTime':
                result = engine.addTime();
                break;
              case 'end':
                result = engine.end();
                break;
            }
            if (result.ok) events.push(...(result.events ?? []));
            else expect(result).toEqual({ ok: false, error: expect.any(String), message: expect.any(String) });
          }
          for (const event of events) {
            seen.set(event.type, (seen.get(event.type) ?? 0) + 1);
            if (event.type === 'round_revealed') continue;
            const names = fieldNames(event);
            for (const forbidden of NEVER_BEFORE_REVEAL) expect({ type: event.type, has: forbidden, found: names.has(forbidden) }).toMatchObject({ found: false });
            if (!POINTS_EVENTS.has(event.type)) expect({ type: event.type, found: names.has('points') }).toMatchObject({ found: false });
          }
        },
      ),
      { numRuns: 300, seed: 4242 },
    );
    // The random sessions did reach the interesting events.
    for (const type of ['round_opened', 'votes_changed', 'answer_accepted', 'round_closed', 'round_revealed', 'call_passed']) {
      expect({ type, seen: (seen.get(type) ?? 0) > 0 }).toEqual({ type, seen: true });
    }
  });

  it('does carry correctness in round_revealed (the check above can see it)', () => {
    const { engine } = makeSession({ format: 'solo', players: [{ id: 'p1', team: 't0' }] });
    engine.start();
    engine.openRound();
    engine.submit({ playerId: 'p1', clientMessageId: 'x', response: pick('a') });
    const revealed = engine.reveal();
    expect(revealed.ok && fieldNames(revealed.events.find((e) => e.type === 'round_revealed')).has('correct')).toBe(true);
  });
});
