/** Where students open the player app, and the link a QR code carries for one join code. */
export function playerAddress(origin: string, joinCode?: string): string {
  const base = `${origin}/play/`;
  return joinCode ? `${base}?code=${encodeURIComponent(joinCode)}` : base;
}
