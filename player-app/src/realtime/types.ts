import type { ApiError, JoinInfoResponse, JoinRequest, JoinResponse } from '@covalent/shared-types';

export type { JoinInfoResponse, JoinRequest };

/** `POST /api/play/join` success. */
export type JoinSuccess = JoinResponse;

type Failure = Pick<ApiError, 'ok' | 'error' | 'message'>;

export type JoinResult = JoinSuccess | Failure;
export type JoinInfoResult = JoinInfoResponse | Failure;
export type RosterChoice = NonNullable<JoinInfoResponse['roster']>[number];
