import type { ApiError } from '@covalent/shared-types';

/** Body of `POST /api/play/join`. Move to shared-types once the server route lands. */
export interface JoinRequest {
  code: string;
  nickname: string;
}

export interface JoinSuccess {
  ok: true;
  /** Signed, session-scoped token that identifies this player and lets them rejoin. */
  playerToken: string;
  sessionId: string;
}

export type JoinResult = JoinSuccess | Pick<ApiError, 'ok' | 'error' | 'message'>;
