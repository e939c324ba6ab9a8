import type {
  CatchupCardResultDto,
  CatchupResultsDto,
  CatchupStudentResultDto,
  CatchupSummaryDto,
  ClassStudentTrendDto,
  ClassTrendDto,
  DebriefDto,
  DebriefItemDto,
  DebriefStudentDto,
  DebriefSummaryDto,
  DebriefTeamDto,
  DeletePlayerDataResponse,
  DistractorRowDto,
  FigureDto,
  MissedItemDto,
  StudentCatchupDto,
  StudentHistoryDto,
  StudentSessionDto,
} from '@covalent/shared-types';

/** Debrief test data in one place; override only what a test is about. */
export const SESSION_ID = '7c1e0a00-0000-4000-8000-000000000001';
export const CLASS_ID = '7c1e0a00-0000-4000-8000-0000000000c1';
export const CATCHUP_ID = '7c1e0a00-0000-4000-8000-0000000000a1';
export const ENTRY_ID = '7c1e0a00-0000-4000-8000-0000000000e1';

export const fig = (value: number): FigureDto => ({ value, reason: null });
export const noFig = <T = number>(reason: string): FigureDto<T> => ({ value: null, reason });

export function makeDebriefSummary(overrides: Partial<DebriefSummaryDto> = {}): DebriefSummaryDto {
  return {
    sessionId: SESSION_ID,
    bankId: '7c1e0a00-0000-4000-8000-0000000000b1',
    bankTitle: 'Lab glassware',
    classId: CLASS_ID,
    className: 'Chemistry 10B',
    format: 'huddle',
    unit: 'player',
    playedAt: '2025-03-04T09:15:00.000Z',
    endedAt: '2025-03-04T09:40:00.000Z',
    playerCount: 24,
    removedCount: 0,
    itemCount: 3,
    classAccuracy: fig(0.625),
    reliability: { method: 'kr20', value: fig(0.71), sem: fig(1.12), excludedItemIds: [] },
    revisitCount: 2,
    ...overrides,
  };
}

export function makeDistractorRow(overrides: Partial<DistractorRowDto> = {}): DistractorRowDto {
  return {
    optionId: 'opt-a',
    letter: 'A',
    text: 'Beaker',
    isKey: false,
    overall: 0.2,
    upper: fig(0.1),
    lower: fig(0.3),
    nonFunctional: false,
    review: false,
    ...overrides,
  };
}

export function makeDebriefItem(overrides: Partial<DebriefItemDto> = {}): DebriefItemDto {
  return {
    id: '7c1e0a00-0000-4000-8000-0000000000i1',
    position: 0,
    prompt: 'Which glassware measures 25.00 mL most accurately?',
    type: 'single',
    tags: ['glassware'],
    answeredCount: 24,
    p: fig(0.5),
    D: fig(0.4),
    upperP: fig(0.8),
    lowerP: fig(0.4),
    pointBiserial: fig(0.35),
    reliabilityIfDeleted: fig(0.68),
    flags: [],
    revisit: true,
    distractors: {
      value: {
        rows: [
          makeDistractorRow(),
          makeDistractorRow({ optionId: 'opt-b', letter: 'B', text: 'Volumetric pipette', isKey: true, overall: 0.5, upper: fig(0.8), lower: fig(0.4) }),
          makeDistractorRow({ optionId: 'opt-c', letter: 'C', text: 'Measuring cylinder', overall: 0.26, upper: fig(0.1), lower: fig(0.2) }),
          makeDistractorRow({ optionId: 'opt-d', letter: 'D', text: 'Conical flask', overall: 0.02, upper: fig(0), lower: fig(0.05), nonFunctional: true }),
        ],
      notAnswered: { overall: 0.02, upper: fig(0), lower: fig(0.05) },
      },
      reason: null,
    },
    explanation: 'A volumetric pipette delivers one fixed volume to ±0.03 mL.',
    key: { type: 'single', correctOptionId: 'opt-b' },
    keyText: 'B. Volumetric pipette',
    ...overrides,
  };
}

export function makeMissedItem(overrides: Partial<MissedItemDto> = {}): MissedItemDto {
  return {
    itemId: '7c1e0a00-0000-4000-8000-0000000000i1',
    position: 0,
    prompt: 'Which glassware measures 25.00 mL most accurately?',
    credit: 0,
    answered: true,
    answer: { type: 'single', optionId: 'opt-a' },
    answerText: 'A. Beaker',
    key: { type: 'single', correctOptionId: 'opt-b' },
    keyText: 'B. Volumetric pipette',
    ...overrides,
  };
}

export function makeDebriefStudent(overrides: Partial<DebriefStudentDto> = {}): DebriefStudentDto {
  return {
    playerId: '7c1e0a00-0000-4000-8000-0000000000p1',
    nickname: 'Argon',
    rosterEntryId: null,
    rosterName: 'Amal Haddad',
    teamId: 't1',
    score: 2,
    // A student's percent is 0..100 on the wire (the debrief's percentOf).
    percent: fig(200 / 3),
    answered: 3,
    missed: [],
    removed: false,
    ...overrides,
  };
}

export function makeDebriefTeam(overrides: Partial<DebriefTeamDto> = {}): DebriefTeamDto {
  return { id: 't1', name: 'Team Neon', points: 1800, accuracy: fig(0.75), unityRate: fig(0.5), memberCount: 4, ...overrides };
}

export function makeDebrief(overrides: Partial<DebriefDto> = {}): DebriefDto {
  return { ...makeDebriefSummary(), items: [makeDebriefItem()], students: [makeDebriefStudent()], teams: [makeDebriefTeam()], ...overrides };
}

export function makeClassTrend(overrides: Partial<ClassTrendDto> = {}): ClassTrendDto {
  return {
    classId: CLASS_ID,
    className: 'Chemistry 10B',
    sessions: [
      { sessionId: 's1', bankTitle: 'Lab glassware', endedAt: '2025-03-04T09:40:00.000Z' },
      { sessionId: 's2', bankTitle: 'Lab safety', endedAt: '2025-03-11T09:40:00.000Z' },
    ],
    tags: [
      {
        tag: 'glassware',
        points: [
          { sessionId: 's1', endedAt: '2025-03-04T09:40:00.000Z', itemCount: 3, accuracy: fig(0.5) },
          { sessionId: 's2', endedAt: '2025-03-11T09:40:00.000Z', itemCount: 2, accuracy: fig(0.75) },
        ],
      },
      { tag: 'safety', points: [{ sessionId: 's2', endedAt: '2025-03-11T09:40:00.000Z', itemCount: 4, accuracy: fig(0.9) }] },
    ],
    catchups: [],
    students: [],
    ...overrides,
  };
}

export function makeCatchupSummary(overrides: Partial<CatchupSummaryDto> = {}): CatchupSummaryDto {
  return {
    id: CATCHUP_ID,
    sessionId: SESSION_ID,
    bankTitle: 'Lab glassware',
    code: 'KX7P2M',
    createdAt: '2025-03-04T10:00:00.000Z',
    closedAt: null,
    studentCount: 12,
    startedCount: 5,
    cardCount: 20,
    clearedCount: 7,
    boxCounts: [13, 5, 2, 0, 0],
    attempts: 16,
    correctAttempts: 10,
    accuracy: fig(0.625),
    ...overrides,
  };
}

export function makeCatchupCard(overrides: Partial<CatchupCardResultDto> = {}): CatchupCardResultDto {
  return {
    itemId: '7c1e0a00-0000-4000-8000-0000000000i1',
    prompt: 'Which glassware measures 25.00 mL most accurately?',
    box: 1,
    dueAt: '2025-03-05T10:00:00.000Z',
    attempts: 0,
    correctAttempts: 0,
    lastCorrect: null,
    lastAnsweredAt: null,
    ...overrides,
  };
}

export function makeCatchupStudentResult(overrides: Partial<CatchupStudentResultDto> = {}): CatchupStudentResultDto {
  return { rosterEntryId: ENTRY_ID, displayName: 'Amal H.', items: [makeCatchupCard()], ...overrides };
}

export function makeCatchupResults(overrides: Partial<CatchupResultsDto> = {}): CatchupResultsDto {
  return {
    id: CATCHUP_ID,
    sessionId: SESSION_ID,
    code: 'KX7P2M',
    createdAt: '2025-03-04T10:00:00.000Z',
    closedAt: null,
    students: [makeCatchupStudentResult()],
    ...overrides,
  };
}

export function makeClassStudentTrend(overrides: Partial<ClassStudentTrendDto> = {}): ClassStudentTrendDto {
  return { rosterEntryId: ENTRY_ID, displayName: 'Amal H.', sessionsPlayed: 2, meanPercent: fig(60), openCards: 3, clearedCards: 1, ...overrides };
}

export function makeStudentSession(overrides: Partial<StudentSessionDto> = {}): StudentSessionDto {
  return {
    sessionId: SESSION_ID,
    bankTitle: 'Lab glassware',
    playedAt: '2025-03-04T09:15:00.000Z',
    endedAt: '2025-03-04T09:40:00.000Z',
    format: 'huddle',
    score: 2,
    // Student percents are 0..100 on the wire; catch-up accuracy is a 0..1 share.
    percent: fig(200 / 3),
    itemCount: 3,
    answered: 3,
    missed: [],
    ...overrides,
  };
}

export function makeStudentCatchup(overrides: Partial<StudentCatchupDto> = {}): StudentCatchupDto {
  return {
    catchupId: CATCHUP_ID,
    sessionId: SESSION_ID,
    bankTitle: 'Lab glassware',
    createdAt: '2025-03-04T10:00:00.000Z',
    closedAt: null,
    cardCount: 1,
    clearedCount: 0,
    attempts: 0,
    correctAttempts: 0,
    items: [makeCatchupCard()],
    ...overrides,
  };
}

export function makeStudentHistory(overrides: Partial<StudentHistoryDto> = {}): StudentHistoryDto {
  return {
    classId: CLASS_ID,
    className: 'Chemistry 10B',
    rosterEntryId: ENTRY_ID,
    displayName: 'Amal H.',
    tableGroup: '3',
    sessions: [makeStudentSession()],
    catchups: [makeStudentCatchup()],
    meanPercent: fig(200 / 3),
    canDeleteData: true,
    ...overrides,
  };
}

export function makeDeletePlayerData(deletedResponses = 3): DeletePlayerDataResponse {
  return { ok: true, deletedResponses };
}
