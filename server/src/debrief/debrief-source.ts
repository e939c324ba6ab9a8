import type { Format, ItemResponse } from '@covalent/shared-types';
import type { SessionItem } from '../sessions/entities/session.entity';

/** Everything the debrief of one session is built from, as loaded from the database. */
export interface DebriefSource {
  session: {
    id: string;
    bankId: string | null;
    bankTitle: string;
    classId: string | null;
    className: string | null;
    format: Format;
    startedAt: Date | null;
    createdAt: Date;
    endedAt: Date | null;
  };
  /** Items of the rounds that were opened, in play order. */
  items: SessionItem[];
  players: SourcePlayer[];
  teams: { id: string; name: string }[];
  /** Each player's answer that counted in a round (responses.final). */
  responses: SourceResponse[];
  /** Team results per round, as the game scored them. */
  teamRounds: SourceTeamRound[];
}

export interface SourcePlayer {
  id: string;
  nickname: string;
  rosterEntryId: string | null;
  rosterName: string | null;
  teamId: string | null;
  /** Data deleted on request or by retention. */
  deleted: boolean;
  /** Removed by the host during the session. */
  removedByHost: boolean;
}

export interface SourceResponse {
  playerId: string;
  teamId: string | null;
  itemId: string;
  response: ItemResponse | null;
  credit: number;
}

export interface SourceTeamRound {
  teamId: string;
  itemId: string;
  points: number;
  /** Null in solo, where correctShare says how many members were right. */
  correct: boolean | null;
  correctShare: number;
  unity: boolean;
}
