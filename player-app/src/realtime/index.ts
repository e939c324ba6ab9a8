export { joinSession, setPlayerConnection } from './commands';
export { PlayerConnection, parseJoinResult } from './PlayerConnection';
export type { FetchLike, PlayerConnectionOptions } from './PlayerConnection';
export { PLAYER_TOKEN_KEY, clearPlayerToken, loadPlayerToken, savePlayerToken } from './playerTokenStorage';
export type { JoinRequest, JoinResult, JoinSuccess } from './types';
