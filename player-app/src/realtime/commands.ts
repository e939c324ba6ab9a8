import type { ItemResponse } from '@covalent/shared-types';
import { useConnectionStore } from '@/stores/useConnectionStore';
import { useGameStore } from '@/stores/useGameStore';
import { useSessionStore } from '@/stores/useSessionStore';
import { PlayerConnection } from './PlayerConnection';
import { PlayerSocket } from './PlayerSocket';
import { clearPlayerToken, loadPlayerToken, savePlayerToken } from './playerTokenStorage';
import type { JoinInfoResult, JoinRequest, JoinResult } from './types';

/** The app's single REST client and single socket; tests swap them with `configureRealtime`. */
let connection = new PlayerConnection();
let socket = new PlayerSocket();

export function configureRealtime(next: { connection?: PlayerConnection; socket?: PlayerSocket }): void {
  if (next.connection) connection = next.connection;
  if (next.socket) {
    socket.disconnect();
    socket = next.socket;
  }
}

export function setPlayerConnection(next: PlayerConnection): void {
  configureRealtime({ connection: next });
}

/** Session title and, for class sessions, the roster to pick a name from. */
export function fetchJoinInfo(code: string): Promise<JoinInfoResult> {
  return connection.joinInfo(code);
}

async function join(request: JoinRequest, nickname: string): Promise<JoinResult> {
  const result = await connection.join(request);
  if (result.ok) {
    savePlayerToken(result.playerToken);
    useConnectionStore.getState().reset();
    useSessionStore.getState().setJoined({
      sessionId: result.sessionId,
      playerToken: result.playerToken,
      nickname,
    });
    void socket.connect(result.playerToken);
  }
  return result;
}

/**
 * Joins a session with an already-validated code and nickname. On success the token is kept
 * for rejoining, the session store moves to `joined` and the socket connects; on failure
 * nothing changes and the result carries the server's message for the form to show.
 */
export function joinSession(code: string, nickname: string): Promise<JoinResult> {
  return join({ code, nickname }, nickname);
}

/** Joins by picking a name from the class roster. */
export function joinWithRosterEntry(code: string, rosterEntryId: string, displayName: string): Promise<JoinResult> {
  return join({ code, rosterEntryId }, displayName);
}

/** A reload with a stored token goes straight back in. Returns false when there is none. */
export function resumeStoredSession(): boolean {
  const token = loadPlayerToken();
  if (!token) return false;
  useSessionStore.getState().resume(token);
  void socket.connect(token);
  return true;
}

export function submitAnswer(roundIndex: number, response: ItemResponse, lock?: boolean) {
  return socket.submitAnswer(roundIndex, response, lock);
}

export function lockAnswer(roundIndex: number) {
  return socket.lockAnswer(roundIndex);
}

/** Leaves for the join screen (after the end, or after being removed). */
export function leaveSession(): void {
  socket.disconnect();
  clearPlayerToken();
  useGameStore.getState().reset();
  useConnectionStore.getState().reset();
  useSessionStore.getState().reset();
}
