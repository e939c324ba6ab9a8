export {
  configureRealtime,
  fetchJoinInfo,
  joinSession,
  joinWithRosterEntry,
  leaveSession,
  lockAnswer,
  resumeStoredSession,
  setPlayerConnection,
  submitAnswer,
} from './commands';
export { bestClockSample, clockSample, remainingMs } from './clockOffset';
export type { ClockSample } from './clockOffset';
export { PlayerConnection, parseJoinInfo, parseJoinResult } from './PlayerConnection';
export type { FetchLike, PlayerConnectionOptions } from './PlayerConnection';
export { NOT_CONNECTED, PlayerSocket, TIMED_OUT } from './PlayerSocket';
export type { CommandFailure, PlayerSocketOptions } from './PlayerSocket';
export { PLAYER_TOKEN_KEY, clearPlayerToken, loadPlayerToken, savePlayerToken } from './playerTokenStorage';
export type { CommandAck, PlayerSocketTransport, SocketFactory } from './socketTransport';
export type { JoinInfoResult, JoinRequest, JoinResult, JoinSuccess, RosterChoice } from './types';
