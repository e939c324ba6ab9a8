import { describe, expect, it } from 'vitest';
import { makeRosterEntry } from '@/test/authoringFactories';
import { groupByTable } from './groupByTable';

describe('groupByTable', () => {
  it('groups by table in natural order with free seating last, seats ascending and unseated last', () => {
    const roster = [
      makeRosterEntry({ displayName: 'Finn W.', tableGroup: '10', seatNumber: 1 }),
      makeRosterEntry({ displayName: 'Diego M.', tableGroup: '2', seatNumber: null }),
      makeRosterEntry({ displayName: 'Zara K.', tableGroup: '2', seatNumber: 2 }),
      makeRosterEntry({ displayName: 'Lena P.', tableGroup: null }),
      makeRosterEntry({ displayName: 'Amara O.', tableGroup: '2', seatNumber: 1 }),
    ];
    const groups = groupByTable(roster);
    expect(groups.map((g) => g.table)).toEqual(['2', '10', null]);
    expect(groups[0].entries.map((e) => e.displayName)).toEqual(['Amara O.', 'Zara K.', 'Diego M.']);
  });
});
