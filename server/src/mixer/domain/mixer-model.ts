import type { CostBreakdown, MixerInput, MixerMode, PairingHistory } from './mixer.types';

/**
 * Weights of the search cost. Keep-apart dwarfs everything so it is broken only
 * when no arrangement honours it; keep-together comes next; the soft costs are
 * of the same order so that one same-table pair ≈ one pairing from last session
 * ≈ a 0.1 spread of team means. Tuning choices, not taken from a source.
 */
export const MIXER_WEIGHTS = {
  keepApart: 1_000_000,
  keepTogether: 10_000,
  sameTable: 1,
  /** Multiplies 1/sessionsAgo for each earlier session a pair shared a team. */
  repeat: 1,
  /** Multiplies max − min of team mean prior scores (a number in [0, 1]). */
  performanceSpread: 10,
  /**
   * Multiplies the root-mean-square deviation of team means from the class mean.
   * The range alone only moves when the single top or bottom team does, so swap
   * search stalls once two teams tie at an extreme; this smooth companion keeps it going.
   */
  performanceRms: 10,
} as const;

/** Teams of four when neither a count nor a size is given (common practice). */
export const DEFAULT_TARGET_SIZE = 4;

/** The input in index form: players sorted by id, pair relations as n×n matrices. */
export interface MixerModel {
  readonly n: number;
  readonly mode: MixerMode;
  /** Player ids sorted by code unit, so the input order never matters. */
  readonly ids: readonly string[];
  readonly indexOf: ReadonlyMap<string, number>;
  readonly apart: Uint8Array;
  readonly together: Uint8Array;
  readonly sameTable: Uint8Array;
  /** Σ 1/sessionsAgo over earlier sessions in which the pair shared a team. */
  readonly history: Float64Array;
  /** Prior score per player, the class mean standing in for a missing one. */
  readonly prior: Float64Array;
  /** Mean of the known prior scores (0 when nobody has one). */
  readonly classMean: number;
  readonly keepTogetherPairs: number;
  /** Search cost of putting a pair in one team (keep-together as a negative offset). */
  readonly pairWeight: Float64Array;
}

const byCodeUnit = (a: string, b: string): number => (a < b ? -1 : a > b ? 1 : 0);

export function sortIds(ids: readonly string[]): string[] {
  return ids.slice().sort(byCodeUnit);
}

export function resolveTeamCount(n: number, teamCount?: number, targetSize?: number): number {
  if (n === 0) return 0;
  let raw: number;
  if (teamCount !== undefined) {
    assertPositiveInteger(teamCount, 'teamCount');
    raw = teamCount;
  } else {
    const size = targetSize ?? DEFAULT_TARGET_SIZE;
    assertPositiveInteger(size, 'targetSize');
    raw = Math.ceil(n / size);
  }
  return Math.min(Math.max(raw, 1), n);
}

export function buildModel(input: MixerInput): MixerModel {
  const ids = sortIds(input.players.map((p) => p.id));
  const n = ids.length;
  const indexOf = new Map<string, number>();
  ids.forEach((id, i) => {
    if (indexOf.has(id)) throw new RangeError(`duplicate player id ${id}`);
    indexOf.set(id, i);
  });

  const tableGroup: (string | null)[] = new Array<string | null>(n).fill(null);
  const known: (number | null)[] = new Array<number | null>(n).fill(null);
  for (const p of input.players) {
    const i = indexOf.get(p.id) as number;
    tableGroup[i] = p.tableGroup;
    if (p.priorScore !== null) {
      if (!(p.priorScore >= 0 && p.priorScore <= 1)) {
        throw new RangeError(`priorScore of ${p.id} must be in [0, 1]`);
      }
      known[i] = p.priorScore;
    }
  }

  const apart = pairMatrix(n, indexOf, input.keepApart);
  const together = pairMatrix(n, indexOf, input.keepTogether);
  const sameTable = new Uint8Array(n * n);
  for (let a = 0; a < n; a++) {
    for (let b = a + 1; b < n; b++) {
      if (tableGroup[a] !== null && tableGroup[a] === tableGroup[b]) setPair(sameTable, n, a, b, 1);
    }
  }
  const history = historyMatrix(n, indexOf, input.history);
  const classMean = meanOfKnown(known);
  const prior = Float64Array.from(known, (s) => s ?? classMean);

  let keepTogetherPairs = 0;
  const soft = input.mode !== 'random';
  const pairWeight = new Float64Array(n * n);
  for (let a = 0; a < n; a++) {
    for (let b = 0; b < n; b++) {
      if (a === b) continue;
      const k = a * n + b;
      if (a < b && together[k]) keepTogetherPairs++;
      pairWeight[k] =
        MIXER_WEIGHTS.keepApart * apart[k] -
        MIXER_WEIGHTS.keepTogether * together[k] +
        (soft ? MIXER_WEIGHTS.sameTable * sameTable[k] + MIXER_WEIGHTS.repeat * history[k] : 0);
    }
  }

  return {
    n, mode: input.mode, ids, indexOf, apart, together, sameTable, history, prior, classMean,
    keepTogetherPairs, pairWeight,
  };
}

/** The breakdown of teams given as player indices of the model. */
export function evaluate(model: MixerModel, teams: readonly (readonly number[])[]): CostBreakdown {
  const { n } = model;
  let sameTablePairs = 0;
  let repeatPairs = 0;
  let repeatWeight = 0;
  let keepApartViolations = 0;
  let keptTogether = 0;
  for (const team of teams) {
    for (let x = 0; x < team.length; x++) {
      for (let y = x + 1; y < team.length; y++) {
        const k = team[x] * n + team[y];
        sameTablePairs += model.sameTable[k];
        keepApartViolations += model.apart[k];
        keptTogether += model.together[k];
        if (model.history[k] > 0) {
          repeatPairs++;
          repeatWeight += model.history[k];
        }
      }
    }
  }
  const keepTogetherViolations = model.keepTogetherPairs - keptTogether;
  const means = teams.map((t) => meanOf(t, model.prior));
  const performanceSpread = spreadOf(means);

  let total =
    MIXER_WEIGHTS.keepApart * keepApartViolations + MIXER_WEIGHTS.keepTogether * keepTogetherViolations;
  if (model.mode !== 'random') {
    total += MIXER_WEIGHTS.sameTable * sameTablePairs + MIXER_WEIGHTS.repeat * repeatWeight;
  }
  if (model.mode === 'balanced') {
    total +=
      MIXER_WEIGHTS.performanceSpread * performanceSpread +
      MIXER_WEIGHTS.performanceRms * rmsDeviation(means, model.classMean);
  }

  return { sameTablePairs, repeatPairs, keepApartViolations, keepTogetherViolations, performanceSpread, total };
}

export function meanOf(team: readonly number[], prior: Float64Array): number {
  let sum = 0;
  for (const i of team) sum += prior[i];
  return team.length === 0 ? 0 : sum / team.length;
}

/** √(Σ (mean − classMean)² / teams). */
export function rmsDeviation(means: readonly number[], classMean: number): number {
  if (means.length === 0) return 0;
  const squares = means.reduce((s, m) => s + (m - classMean) ** 2, 0);
  return Math.sqrt(squares / means.length);
}

export function spreadOf(means: readonly number[]): number {
  return means.length < 2 ? 0 : Math.max(...means) - Math.min(...means);
}

function assertPositiveInteger(value: number, name: string): void {
  if (!Number.isInteger(value) || value < 1) throw new RangeError(`${name} must be a positive integer`);
}

function setPair(m: Uint8Array | Float64Array, n: number, a: number, b: number, value: number): void {
  m[a * n + b] = value;
  m[b * n + a] = value;
}

/** Pairs naming an absent player, or the same player twice, are ignored. */
function pairMatrix(n: number, indexOf: ReadonlyMap<string, number>, pairs: readonly [string, string][]): Uint8Array {
  const m = new Uint8Array(n * n);
  for (const [x, y] of pairs) {
    const a = indexOf.get(x);
    const b = indexOf.get(y);
    if (a !== undefined && b !== undefined && a !== b) setPair(m, n, a, b, 1);
  }
  return m;
}

function historyMatrix(
  n: number,
  indexOf: ReadonlyMap<string, number>,
  history: readonly PairingHistory[],
): Float64Array {
  const m = new Float64Array(n * n);
  for (const session of history) {
    if (!(Number.isInteger(session.sessionsAgo) && session.sessionsAgo >= 1)) {
      throw new RangeError('sessionsAgo must be an integer ≥ 1');
    }
    // Recency weight 1/sessionsAgo: last session counts fully, older ones fade.
    const weight = 1 / session.sessionsAgo;
    for (const team of session.teams) {
      const present = [...new Set(team.map((id) => indexOf.get(id)))].filter(
        (i): i is number => i !== undefined,
      );
      for (let x = 0; x < present.length; x++) {
        for (let y = x + 1; y < present.length; y++) {
          const k = present[x] * n + present[y];
          setPair(m, n, present[x], present[y], m[k] + weight);
        }
      }
    }
  }
  return m;
}

function meanOfKnown(known: readonly (number | null)[]): number {
  const scores = known.filter((s): s is number => s !== null);
  return scores.length === 0 ? 0 : scores.reduce((s, x) => s + x, 0) / scores.length;
}
