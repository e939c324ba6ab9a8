/** One item played in the session. */
export interface DebriefItem {
  id: string;
  /** Empty for non-choice items (order, numeric, text). */
  optionIds: string[];
  correctOptionIds: string[];
  /** Credit can only be 0 or 1 (single, truefalse, and any item scored all-or-nothing). */
  dichotomous: boolean;
}

/**
 * A unit of analysis: a player, or in `numbered` a team submission; the caller decides.
 * List the examinees present in the session; `removed` ones (data deleted on request)
 * are left out of every figure and only counted.
 */
export interface DebriefExaminee {
  id: string;
  removed?: boolean;
}

export interface DebriefResponse {
  examineeId: string;
  itemId: string;
  /** 0..1 */
  credit: number;
  /** For choice items; empty otherwise or when not answered. */
  chosenOptionIds: string[];
  answered: boolean;
}

export interface DebriefTeam {
  id: string;
  memberIds: string[];
}

/** A team's result in one round, as the game scored it. */
export interface DebriefTeamRound {
  teamId: string;
  itemId: string;
  points: number;
  correct: boolean;
  unity: boolean;
}

export interface DebriefInput {
  items: DebriefItem[];
  examinees: DebriefExaminee[];
  /** A missing (examinee, item) pair means not answered: credit 0. */
  responses: DebriefResponse[];
  teams?: DebriefTeam[];
  /** A missing (team, item) pair means the team scored nothing in that round. */
  teamRounds?: DebriefTeamRound[];
}

/** Thrown for input the caller should never send: unknown ids, duplicates, credit outside 0..1. */
export class DebriefInputError extends Error {
  constructor(message: string) {
    super(message);
    this.name = DebriefInputError.name;
  }
}
