import type { DebriefItemDto, FigureDto } from '@covalent/shared-types';

export type ItemSortKey = 'position' | 'p' | 'D' | 'pointBiserial' | 'flags';
export type SortDir = 'asc' | 'desc';

const figure = (f: FigureDto): number | null => f.value;

function sortValue(item: DebriefItemDto, key: ItemSortKey): number | null {
  switch (key) {
    case 'position':
      return item.position;
    case 'p':
      return figure(item.p);
    case 'D':
      return figure(item.D);
    case 'pointBiserial':
      return figure(item.pointBiserial);
    case 'flags':
      return item.flags.length;
  }
}

/** Items ordered by one figure; figures that could not be computed go last either way, ties by play order. */
export function sortItems(items: readonly DebriefItemDto[], key: ItemSortKey, dir: SortDir): DebriefItemDto[] {
  const sign = dir === 'asc' ? 1 : -1;
  return [...items].sort((a, b) => {
    const va = sortValue(a, key);
    const vb = sortValue(b, key);
    if (va === null && vb === null) return a.position - b.position;
    if (va === null) return 1;
    if (vb === null) return -1;
    return (va - vb) * sign || a.position - b.position;
  });
}
