import { describe, expect, it } from 'vitest';
import { buildCreateSessionRequest, DEFAULT_SETUP, type SessionSetupValues } from './buildCreateSessionRequest';

const values = (overrides: Partial<SessionSetupValues> = {}): SessionSetupValues => ({ ...DEFAULT_SETUP, bankId: 'bank-1', ...overrides });

describe('buildCreateSessionRequest', () => {
  it('uses the defaults: 30 s rounds, speed weight 0.5, all items, ad-hoc group', () => {
    expect(buildCreateSessionRequest(values())).toEqual({
      ok: true,
      request: {
        bankId: 'bank-1',
        classId: null,
        format: 'huddle',
        roundSeconds: 30,
        speedWeight: 0.5,
        standings: 'full',
        targetTeamSize: 4,
        mixerMode: 'mix-tables',
        namePack: 'elements',
      },
    });
  });

  it('sends the chosen items in the chosen order, without the excluded ones', () => {
    const built = buildCreateSessionRequest(values({ itemOrder: ['i3', 'i1', 'i2'], excludedItemIds: ['i1'] }));
    expect(built.ok && built.request.itemIds).toEqual(['i3', 'i2']);
  });

  it('sends a team count instead of a size when the teacher picks a number of teams', () => {
    const built = buildCreateSessionRequest(values({ teamSizing: 'count', teamNumber: '6' }));
    expect(built.ok && built.request).toMatchObject({ teamCount: 6 });
    expect(built.ok && 'targetTeamSize' in built.request).toBe(false);
  });

  it('refuses a missing bank, an empty selection, odd round times and team sizes', () => {
    const built = buildCreateSessionRequest(
      values({ bankId: '', itemOrder: ['i1'], excludedItemIds: ['i1'], roundSeconds: '2.5', teamNumber: '0' }),
    );
    expect(built.ok).toBe(false);
    expect(!built.ok && Object.keys(built.errors).sort()).toEqual(['bankId', 'items', 'roundSeconds', 'teamNumber']);
  });
});
