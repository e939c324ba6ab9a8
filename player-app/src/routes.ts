/**
 * The player app's routes, relative to the app's base (`/play/`). Until there is more than
 * one screen there is no router; the join page reads its code from either form below.
 */
export const ROUTES = {
  join: '',
  joinWithCode: 'join/:code',
  catchup: 'catchup/:code',
} as const;

const base = import.meta.env.BASE_URL;

export const paths = {
  /** `/play/` or `/play/join/ABC234`: what a QR code on the host screen can open. */
  join: (code?: string): string => (code ? `${base}join/${encodeURIComponent(code)}` : base),
  /** `/play/catchup/ABC234`: a self-paced catch-up from the teacher's debrief. */
  catchup: (code: string): string => `${base}catchup/${encodeURIComponent(code)}`,
};
