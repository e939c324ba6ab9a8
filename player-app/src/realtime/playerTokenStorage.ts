export const PLAYER_TOKEN_KEY = 'covalent.playerToken';

// Storage can throw (private browsing, storage disabled by policy); joining must still work.

export function savePlayerToken(token: string): void {
  try {
    localStorage.setItem(PLAYER_TOKEN_KEY, token);
  } catch {
    // Without storage the player simply cannot rejoin after a reload.
  }
}

export function loadPlayerToken(): string | null {
  try {
    return localStorage.getItem(PLAYER_TOKEN_KEY);
  } catch {
    return null;
  }
}

export function clearPlayerToken(): void {
  try {
    localStorage.removeItem(PLAYER_TOKEN_KEY);
  } catch {
    // nothing to clear
  }
}
