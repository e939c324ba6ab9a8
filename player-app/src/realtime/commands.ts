import { useSessionStore } from '@/stores/useSessionStore';
import { PlayerConnection } from './PlayerConnection';
import { savePlayerToken } from './playerTokenStorage';
import type { JoinResult } from './types';

/** The app's single connection; tests may swap it with `setPlayerConnection`. */
let connection = new PlayerConnection();

export function setPlayerConnection(next: PlayerConnection): void {
  connection = next;
}

/**
 * Joins a session with an already-validated code and nickname. On success the token is kept
 * for rejoining and the session store moves to `joined`; on failure nothing changes and the
 * result carries the server's message for the form to show.
 */
export async function joinSession(code: string, nickname: string): Promise<JoinResult> {
  const result = await connection.join(code, nickname);
  if (result.ok) {
    savePlayerToken(result.playerToken);
    useSessionStore.getState().setJoined({
      sessionId: result.sessionId,
      playerToken: result.playerToken,
      nickname,
    });
  }
  return result;
}
