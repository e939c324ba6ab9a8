import { normaliseJoinCode } from './joinCode';

/** The path form the host screen's QR code may use: `<base>join/ABC234`. */
const JOIN_PATH = /\/join\/([^/]+)\/?$/;

/**
 * The join code carried by a link (`/play/?code=ABC234` or `/play/join/ABC234`),
 * normalised, or '' when the link carries none. Not validated: the form does that.
 */
export function readJoinCodeFromUrl(location: Pick<Location, 'pathname' | 'search'>): string {
  const fromQuery = new URLSearchParams(location.search).get('code');
  if (fromQuery) return normaliseJoinCode(fromQuery);
  const match = JOIN_PATH.exec(location.pathname);
  if (!match?.[1]) return '';
  try {
    return normaliseJoinCode(decodeURIComponent(match[1]));
  } catch {
    return ''; // malformed percent-encoding: ignore rather than crash the page
  }
}
