/**
 * Test factories for the session engine specs (kept free of jest globals so the
 * build can compile it). One place for clocks, checkers, responses and sessions.
 */
import seedrandom from 'seedrandom';
import { SessionEngine } from './session-engine';
import type {
  AnswerChecker,
  EngineDeps,
  EngineEvent,
  EngineResult,
  Format,
  SessionConfigInput,
  StandingsView,
} from './types';

/** Wall-clock origin of every test session (ms); rounds are described as offsets from it. */
export const T0 = 1_000_000;

export class FakeClock {
  constructor(public t: number = T0) {}
  now(): number {
    return this.t;
  }
  /** Moves to `T0 + offsetMs`. */
  at(offsetMs: number): this {
    this.t = T0 + offsetMs;
    return this;
  }
  advance(ms: number): this {
    this.t += ms;
    return this;
  }
}

/** A `single` response. */
export function pick(optionId: string): { type: 'single'; optionId: string } {
  return { type: 'single', optionId };
}

/** A checker for `single` items with the given correct option per item index (default 'a'). */
export function singleKeyChecker(keys: readonly string[] = []): AnswerChecker {
  return (itemIndex, response) => {
    const chosen = (response as { optionId?: unknown } | null)?.optionId;
    const correct = chosen === (keys[itemIndex] ?? 'a');
    return { credit: correct ? 1 : 0, correct };
  };
}

export interface PlayerSpec {
  id: string;
  team: string;
  mult?: number;
  number?: number;
}

export interface SessionSpec {
  format: Format;
  players: PlayerSpec[];
  itemCount?: number;
  keys?: string[];
  roundLimitMs?: number;
  speedWeight?: number;
  standings?: StandingsView;
  unityBonus?: number;
  seed?: string;
  rng?: () => number;
  check?: AnswerChecker;
}

export interface TestSession {
  engine: SessionEngine;
  clock: FakeClock;
  deps: EngineDeps;
  config: SessionConfigInput;
}

export function itemsOf(count: number): { id: string }[] {
  return Array.from({ length: count }, (_, i) => ({ id: `item-${i}` }));
}

export function makeDeps(spec: Pick<SessionSpec, 'seed' | 'rng' | 'check' | 'keys'>, clock = new FakeClock()): EngineDeps {
  return {
    clock,
    rng: spec.rng ?? seedrandom(spec.seed ?? 'covalent-test\u0000'),
    check: spec.check ?? singleKeyChecker(spec.keys),
  };
}

/** A session in the lobby with the players' teams created in order of first mention. */
export function makeSession(spec: SessionSpec): TestSession {
  const clock = new FakeClock();
  const deps = makeDeps(spec, clock);
  const config: SessionConfigInput = {
    format: spec.format,
    items: itemsOf(spec.itemCount ?? 2),
    roundLimitMs: spec.roundLimitMs,
    speedWeight: spec.speedWeight,
    standings: spec.standings,
    unityBonus: spec.unityBonus,
  };
  const teams = [...new Set(spec.players.map((p) => p.team))].map((id) => ({ id }));
  const created = SessionEngine.create(
    {
      config,
      teams,
      players: spec.players.map((p) => ({ id: p.id, teamId: p.team, timeMultiplier: p.mult, number: p.number })),
    },
    deps,
  );
  return { engine: must(created).engine, clock, deps, config };
}

/** Unwraps an ok result; throws with the error code otherwise (a failing test). */
export function must<T extends object>(result: EngineResult<T>): { ok: true; events: EngineEvent[] } & T {
  if (!result.ok) throw new Error(`expected ok, got ${result.error}: ${result.message}`);
  return result;
}

export function eventsOfType<K extends EngineEvent['type']>(
  events: readonly EngineEvent[],
  type: K,
): Extract<EngineEvent, { type: K }>[] {
  return events.filter((e): e is Extract<EngineEvent, { type: K }> => e.type === type);
}

let messageCounter = 0;
/** A fresh client message id. */
export function msgId(): string {
  messageCounter += 1;
  return `m-${messageCounter}`;
}
