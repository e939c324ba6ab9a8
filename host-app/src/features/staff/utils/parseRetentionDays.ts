import { RETENTION_DAYS_MAX, RETENTION_DAYS_MIN } from '@covalent/shared-types';

export type ParsedRetentionDays = { ok: true; days: number } | { ok: false; message: string };

const MESSAGE = `Enter a whole number of days from ${RETENTION_DAYS_MIN} to ${RETENTION_DAYS_MAX}.`;

/** The field's text as a day count, checked against the same bounds as the server. */
export function parseRetentionDays(text: string): ParsedRetentionDays {
  const trimmed = text.trim();
  if (!/^\d+$/.test(trimmed)) return { ok: false, message: MESSAGE };
  const days = Number(trimmed);
  if (days < RETENTION_DAYS_MIN || days > RETENTION_DAYS_MAX) return { ok: false, message: MESSAGE };
  return { ok: true, days };
}
