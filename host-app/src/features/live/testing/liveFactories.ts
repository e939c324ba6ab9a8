import type { BankDetailDto, HostSessionView, RoundTiming, SessionDto, TeamView } from '@covalent/shared-types';

/** Live-session test data in one place; override only what a test is about. */
export function makeSessionDto(overrides: Partial<SessionDto> = {}): SessionDto {
  return {
    id: 'sess-1',
    joinCode: 'KX7P2M',
    status: 'lobby',
    bankId: 'bank-1',
    bankTitle: 'Lab entry & exit procedures',
    classId: 'class-1',
    className: 'Chemistry 10 · P3',
    format: 'huddle',
    roundSeconds: 30,
    speedWeight: 0.5,
    standings: 'full',
    mixerMode: 'mix-tables',
    namePack: 'elements',
    itemCount: 8,
    playerCount: 7,
    createdAt: '2025-02-03T09:15:00.000Z',
    endedAt: null,
    ...overrides,
  };
}

export function makeTeams(): TeamView[] {
  return [
    {
      id: 'team-ar',
      name: 'Argon',
      colour: '#E69F00',
      pattern: 'dots',
      members: [
        { playerId: 'p1', nickname: 'Sam', number: 1, status: 'connected' },
        { playerId: 'p2', nickname: 'Noor', number: 2, status: 'connected' },
        { playerId: 'p3', nickname: 'Teo', number: 3, status: 'away' },
        { playerId: 'p4', nickname: 'Ines', number: 4, status: 'connected' },
      ],
    },
    {
      id: 'team-b',
      name: 'Boron',
      colour: '#0072B2',
      pattern: 'stripes',
      members: [
        { playerId: 'p5', nickname: 'Kofi', number: 1, status: 'connected' },
        { playerId: 'p6', nickname: 'Mei', number: 2, status: 'connected' },
        { playerId: 'p7', nickname: 'Ola', number: 3, status: 'connected' },
      ],
    },
  ];
}

export function makeTiming(overrides: Partial<RoundTiming> = {}): RoundTiming {
  const now = Date.now();
  return { roundIndex: 0, status: 'open', deadlineAt: now + 20_000, limitMs: 30_000, paused: false, serverNow: now, ...overrides };
}

type HostRound = NonNullable<HostSessionView['round']>;

export function makeRound(overrides: Partial<HostRound> = {}): HostRound {
  return {
    timing: makeTiming(),
    itemIndex: 2,
    itemCount: 8,
    itemId: 'item-3',
    tags: [],
    item: {
      type: 'single',
      prompt: 'Where do bags go when you enter the lab?',
      options: [
        { id: 'o1', text: 'Under your stool' },
        { id: 'o2', text: 'On the shelf by the door' },
        { id: 'o3', text: 'On the bench' },
      ],
      unitHint: null,
      imageUrl: null,
    },
    progress: [
      { teamId: 'team-ar', answered: 3, members: 4 },
      { teamId: 'team-b', answered: 1, members: 3 },
    ],
    reveal: null,
    ...overrides,
  };
}

export function makeHostView(overrides: Partial<HostSessionView> = {}): HostSessionView {
  return {
    session: makeSessionDto(),
    joiningLocked: false,
    teams: makeTeams(),
    unplaced: [{ playerId: 'p8', nickname: 'Lena' }],
    mixer: {
      mode: 'mix-tables',
      seed: 'seed-1',
      description: '0 same-table pairs, 2 repeat pairs',
      sameTablePairs: 0,
      repeatPairs: 2,
      keepApartViolations: 0,
    },
    round: null,
    standings: [],
    summary: null,
    serverNow: Date.now(),
    ...overrides,
  };
}

/** A view in the middle of a round. */
export function makeRunningView(round: Partial<HostRound> = {}, overrides: Partial<HostSessionView> = {}): HostSessionView {
  return makeHostView({ session: makeSessionDto({ status: 'running' }), unplaced: [], round: makeRound(round), ...overrides });
}

export function makeBankDetail(overrides: Partial<BankDetailDto> = {}): BankDetailDto {
  return {
    id: 'bank-1',
    ownerId: 'u1',
    ownerName: 'Ruth Okafor',
    title: 'Lab entry & exit procedures',
    description: '',
    tags: ['procedures'],
    standardsCode: null,
    archivedAt: null,
    itemCount: 8,
    access: 'owner',
    createdAt: '2025-01-10T09:00:00.000Z',
    updatedAt: '2025-01-10T09:00:00.000Z',
    items: [],
    shares: [],
    ...overrides,
  };
}
