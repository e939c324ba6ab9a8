const CATCHUP_PATH = /\/catchup\/([^/]+)\/?$/;

/** The code of a catch-up link (`<base>catchup/ABC234`), upper-cased, or null when the path is not one. */
export function readCatchupCode(pathname: string): string | null {
  const match = CATCHUP_PATH.exec(pathname);
  if (!match?.[1]) return null;
  try {
    return decodeURIComponent(match[1]).toUpperCase();
  } catch {
    return null; // malformed percent-encoding: not a catch-up link
  }
}
