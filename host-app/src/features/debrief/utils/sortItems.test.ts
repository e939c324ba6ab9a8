import { describe, expect, it } from 'vitest';
import { makeDebriefItem } from '../testing/debriefFactories';
import { sortItems } from './sortItems';

describe('sortItems', () => {
  const items = [
    makeDebriefItem({ id: 'a', position: 0, p: { value: 0.8, reason: null } }),
    makeDebriefItem({ id: 'b', position: 1, p: { value: null, reason: 'nobody answered' } }),
    makeDebriefItem({ id: 'c', position: 2, p: { value: 0.2, reason: null } }),
  ];

  it('orders by the figure in either direction and keeps uncomputed figures last', () => {
    expect(sortItems(items, 'p', 'asc').map((i) => i.id)).toEqual(['c', 'a', 'b']);
    expect(sortItems(items, 'p', 'desc').map((i) => i.id)).toEqual(['a', 'c', 'b']);
  });

  it('does not reorder the input array', () => {
    sortItems(items, 'p', 'asc');
    expect(items.map((i) => i.id)).toEqual(['a', 'b', 'c']);
  });
});
