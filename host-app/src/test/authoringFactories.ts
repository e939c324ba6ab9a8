import type { BankDetailDto, BankDto, ClassDetailDto, ClassDto, ItemDto, MediaDto, RosterEntryDto } from '@covalent/shared-types';

/** Banks, items, classes and rosters for tests; override only what a test is about. */
export function makeBank(overrides: Partial<BankDto> = {}): BankDto {
  return {
    id: '7b000000-0000-4000-8000-000000000001',
    ownerId: '5a4f1e0c-0000-4000-8000-000000000001',
    ownerName: 'Ruth Okafor',
    title: 'Lab entry & exit procedures',
    description: '',
    tags: ['procedures'],
    standardsCode: null,
    archivedAt: null,
    itemCount: 0,
    access: 'owner',
    createdAt: '2026-08-20T09:00:00.000Z',
    updatedAt: '2026-09-01T09:00:00.000Z',
    ...overrides,
  };
}

export function makeBankDetail(overrides: Partial<BankDetailDto> = {}): BankDetailDto {
  const items = overrides.items ?? [];
  return { ...makeBank(), items, shares: [], itemCount: items.length, ...overrides };
}

export function makeItem(overrides: Partial<ItemDto> = {}): ItemDto {
  return {
    id: '1e000000-0000-4000-8000-000000000001',
    bankId: '7b000000-0000-4000-8000-000000000001',
    position: 0,
    type: 'single',
    prompt: 'Where do bags go when you enter the lab?',
    options: [
      { id: 'o1', text: 'Under the bench' },
      { id: 'o2', text: 'On the shelf by the door' },
    ],
    key: { type: 'single', correctOptionId: 'o2' },
    explanation: '',
    tags: [],
    imageId: null,
    createdAt: '2026-09-01T09:00:00.000Z',
    updatedAt: '2026-09-01T09:00:00.000Z',
    ...overrides,
  };
}

export function makeMedia(overrides: Partial<MediaDto> = {}): MediaDto {
  return {
    id: '3c000000-0000-4000-8000-000000000001',
    mime: 'image/png',
    byteSize: 68,
    sha256: '0'.repeat(64),
    url: '/api/media/images/3c000000-0000-4000-8000-000000000001',
    ...overrides,
  };
}

export function makeClass(overrides: Partial<ClassDto> = {}): ClassDto {
  return {
    id: 'c1000000-0000-4000-8000-000000000001',
    ownerId: '5a4f1e0c-0000-4000-8000-000000000001',
    ownerName: 'Ruth Okafor',
    name: 'Chemistry',
    period: '2',
    term: 'Autumn 2026',
    archivedAt: null,
    rosterCount: 0,
    coTeachers: [],
    access: 'owner',
    createdAt: '2026-08-20T09:00:00.000Z',
    updatedAt: '2026-08-20T09:00:00.000Z',
    ...overrides,
  };
}

let entrySeq = 0;
export function makeRosterEntry(overrides: Partial<RosterEntryDto> = {}): RosterEntryDto {
  entrySeq += 1;
  return {
    id: `e0000000-0000-4000-8000-${String(entrySeq).padStart(12, '0')}`,
    classId: 'c1000000-0000-4000-8000-000000000001',
    displayName: `Student ${entrySeq}`,
    tableGroup: null,
    seatNumber: null,
    timeMultiplier: 1,
    ...overrides,
  };
}

export function makeClassDetail(overrides: Partial<ClassDetailDto> = {}): ClassDetailDto {
  const roster = overrides.roster ?? [];
  return { ...makeClass(), roster, pairs: [], rosterCount: roster.length, ...overrides };
}
