/**
 * What the search minimises besides the rules (sizes within one, keep-apart,
 * keep-together, which hold in every mode):
 * - `random`: nothing else, so every arrangement the rules allow is equally
 *   likely (history and tables are still counted in the breakdown, not avoided);
 * - `mix-tables`: same-table pairs and repeat pairings (weighted 1/sessionsAgo);
 * - `balanced`: those, plus the spread of team mean prior scores.
 */
export type MixerMode = 'random' | 'mix-tables' | 'balanced';

export interface MixerPlayer {
  id: string;
  /** Roster table group, or null when unknown (e.g. a nickname join). */
  tableGroup: string | null;
  /** Prior accuracy in [0, 1], or null when the player has no history. */
  priorScore: number | null;
}

export interface PairingHistory {
  /** 1 = the class's last session, 2 = the one before, … */
  sessionsAgo: number;
  /** Player ids per team in that session. */
  teams: string[][];
}

export interface MixerBudget {
  /** Random starting deals tried (at least 1). */
  restarts: number;
  /** Pairwise-swap passes per start (0 = keep the deal as it is). */
  swapPasses: number;
}

export interface MixerInput {
  players: MixerPlayer[];
  /** Wins over targetSize when both are given. */
  teamCount?: number;
  targetSize?: number;
  keepApart: [string, string][];
  keepTogether: [string, string][];
  history: PairingHistory[];
  mode: MixerMode;
  seed: string;
  budget?: MixerBudget;
}

/** What the teacher sees about a set of teams. Counts are of distinct pairs. */
export interface CostBreakdown {
  sameTablePairs: number;
  /** Current teammates who were teammates in at least one session of the history. */
  repeatPairs: number;
  keepApartViolations: number;
  keepTogetherViolations: number;
  /**
   * Max − min of team mean prior scores, reported in every mode (only `balanced`
   * minimises it); 0 without priors or with one team.
   */
  performanceSpread: number;
  /** Weighted cost the search minimised (see MIXER_WEIGHTS); 0 is the best possible. */
  total: number;
}

export interface MixerResult {
  teams: string[][];
  cost: CostBreakdown;
  seed: string;
}
