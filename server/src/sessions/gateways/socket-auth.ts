/** An error that refuses a socket.io connection; the client's `connect_error` carries `data` in the ack error shape. */
export function connectError(error: string, message: string): Error & { data: { ok: false; error: string; message: string } } {
  return Object.assign(new Error(message), { data: { ok: false as const, error, message } });
}

/** One cookie from a Cookie header (RFC 6265 §5.4 pairs); the value is URI-decoded as cookie-parser does. */
export function readCookie(header: string | undefined, name: string): string | undefined {
  if (!header || header.length > 8192) return undefined;
  for (const part of header.split(';')) {
    const eq = part.indexOf('=');
    if (eq < 0 || part.slice(0, eq).trim() !== name) continue;
    let value = part.slice(eq + 1).trim();
    if (value.startsWith('"') && value.endsWith('"')) value = value.slice(1, -1);
    try {
      return decodeURIComponent(value);
    } catch {
      return value;
    }
  }
  return undefined;
}

export const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** Counts a socket's messages in one-second windows. */
export function overLimit(data: { msgWindow?: number; msgCount?: number }, perSecond: number, now: number): boolean {
  const window = Math.floor(now / 1000);
  if (data.msgWindow !== window) {
    data.msgWindow = window;
    data.msgCount = 0;
  }
  data.msgCount = (data.msgCount ?? 0) + 1;
  return data.msgCount > perSecond;
}
