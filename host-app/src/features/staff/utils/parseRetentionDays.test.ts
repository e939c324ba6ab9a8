import { RETENTION_DAYS_MAX, RETENTION_DAYS_MIN } from '@covalent/shared-types';
import { describe, expect, it } from 'vitest';
import { parseRetentionDays } from './parseRetentionDays';

describe(parseRetentionDays.name, () => {
  it('accepts whole numbers at both bounds, ignoring surrounding spaces', () => {
    expect(parseRetentionDays(` ${RETENTION_DAYS_MIN} `)).toEqual({ ok: true, days: RETENTION_DAYS_MIN });
    expect(parseRetentionDays(String(RETENTION_DAYS_MAX))).toEqual({ ok: true, days: RETENTION_DAYS_MAX });
  });

  it.each(['', '0', String(RETENTION_DAYS_MAX + 1), '2.5', '-3', 'abc', '1e3'])('refuses %j', (text) => {
    expect(parseRetentionDays(text)).toEqual({ ok: false, message: 'Enter a whole number of days from 1 to 3650.' });
  });
});
