/**
 * Round points and standings order (DESIGN.md §4 "Points").
 *
 * points = round(1000 · c · (1 − w · t/T)), t clamped to [0, T].
 */

export interface RoundPointsInput {
  /** Credit c ∈ [0, 1] from the answer check. */
  credit: number;
  /** Active (unpaused) time t from the round opening to the answer, in ms. */
  elapsedMs: number;
  /** The player's or team's own (extended) limit T, in ms; must be > 0. */
  limitMs: number;
  /** Speed weight w ∈ [0, 1]; 0 turns speed off. */
  speedWeight: number;
}

/** Points awarded for a full-credit answer given at t = 0. */
export const MAX_ROUND_POINTS = 1000;

/**
 * Decimal places the raw value is snapped to before rounding: binary floats put
 * exact halves a hair below .5 (1000·0.1·(1 − 0.5·0.85) = 57.49999999999999),
 * and a teacher checking by hand expects 58.
 */
const SNAP_DECIMALS = 6;

/** Points for one answer; an integer in [0, 1000]. Halves round up (Math.round, points are never negative). */
export function roundPoints(input: RoundPointsInput): number {
  const { credit, elapsedMs, limitMs, speedWeight } = input;
  if (!(limitMs > 0) || !Number.isFinite(limitMs)) {
    throw new RangeError(`limitMs must be a positive finite number, got ${limitMs}`);
  }
  for (const [name, value] of [
    ['credit', credit],
    ['elapsedMs', elapsedMs],
    ['speedWeight', speedWeight],
  ] as const) {
    if (!Number.isFinite(value)) throw new RangeError(`${name} must be finite, got ${value}`);
  }
  const c = clamp(credit, 0, 1);
  const w = clamp(speedWeight, 0, 1);
  const t = clamp(elapsedMs, 0, limitMs);
  const raw = MAX_ROUND_POINTS * c * (1 - (w * t) / limitMs);
  return Math.round(Number(raw.toFixed(SNAP_DECIMALS)));
}

/** What the standings order looks at, for a team (or a player). */
export interface StandingKey {
  id: string;
  points: number;
  /** Correct answers; may be fractional for a solo team (mean over members). */
  correctAnswers: number;
  /** Total response time in ms; lower is better. */
  responseMs: number;
}

/** Sort comparator: points desc, then more correct answers, then lower total time, then id ascending. */
export function compareStandings(a: StandingKey, b: StandingKey): number {
  return (
    b.points - a.points ||
    b.correctAnswers - a.correctAnswers ||
    a.responseMs - b.responseMs ||
    (a.id < b.id ? -1 : a.id > b.id ? 1 : 0)
  );
}

/** True when two entries tie on every rule except the id (they share a rank). */
export function isStandingTie(a: StandingKey, b: StandingKey): boolean {
  return a.points === b.points && a.correctAnswers === b.correctAnswers && a.responseMs === b.responseMs;
}

function clamp(value: number, lo: number, hi: number): number {
  return Math.min(hi, Math.max(lo, value));
}
