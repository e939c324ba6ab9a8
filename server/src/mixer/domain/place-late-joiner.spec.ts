import { placeLateJoiner } from './place-late-joiner';
import type { MixerPlayer } from './mixer.types';
import { makePlayer } from './mixer.test-factories';

const byId = (players: MixerPlayer[]): Map<string, MixerPlayer> => new Map(players.map((p) => [p.id, p]));

describe('placeLateJoiner', () => {
  const roster = byId([
    makePlayer('a', { tableGroup: 'T1' }),
    makePlayer('b', { tableGroup: 'T1' }),
    makePlayer('c', { tableGroup: 'T2' }),
    makePlayer('d', { tableGroup: 'T1' }),
    makePlayer('e', { tableGroup: 'T2' }),
    makePlayer('f', { tableGroup: null }),
  ]);
  const newcomer = makePlayer('new', { tableGroup: 'T1' });

  it('picks the smallest team even when it holds table-mates', () => {
    expect(placeLateJoiner([['c', 'e', 'f'], ['a', 'b'], ['d', 'c', 'e']], newcomer, roster)).toBe(1);
  });

  it('breaks a size tie by fewest table-mates of the newcomer', () => {
    expect(placeLateJoiner([['a', 'b'], ['c', 'd'], ['e', 'a']], newcomer, roster)).toBe(1);
  });

  it('breaks a remaining tie by the lowest index', () => {
    const t2 = makePlayer('new', { tableGroup: 'T2' });
    // T2 mates per team: 2, 1, 1 → the first of the two teams with one.
    expect(placeLateJoiner([['c', 'e'], ['a', 'c'], ['b', 'e']], t2, roster)).toBe(1);
    expect(placeLateJoiner([['c', 'f'], ['e', 'f']], newcomer, roster)).toBe(0);
  });

  it('counts nobody as a table-mate of a newcomer without a table, nor members missing from the roster', () => {
    expect(placeLateJoiner([['a', 'b'], ['c', 'e']], makePlayer('new'), roster)).toBe(0);
    expect(placeLateJoiner([['a', 'x'], ['ghost', 'y']], newcomer, roster)).toBe(1);
  });

  it('refuses when there is no team', () => {
    expect(() => placeLateJoiner([], newcomer, roster)).toThrow(RangeError);
  });
});
