import { vi } from 'vitest';
import type {
  JoinInfoResponse,
  PlayerItemView,
  PlayerReveal,
  PlayerSessionView,
  RoundTiming,
  TeamView,
} from '@covalent/shared-types';
import type { JoinResult } from '@/realtime';

/** A valid code: every character from the join-code alphabet. */
export const VALID_CODE = 'ABC234';

export const UNKNOWN_CODE_FAILURE: JoinResult = {
  ok: false,
  error: 'unknown_code',
  message: 'No session has that code. Check the code on the board.',
};

export function joinSuccess(
  overrides: Partial<{ playerToken: string; sessionId: string; playerId: string }> = {},
) {
  return {
    ok: true as const,
    sessionId: '6f1c2d1e-0000-4000-8000-000000000001',
    playerId: 'p-me',
    playerToken: 'player-token-abc',
    ...overrides,
  };
}

export function joinInfo(overrides: Partial<JoinInfoResponse> = {}): JoinInfoResponse {
  return { ok: true, sessionTitle: 'Lab entry & exit procedures', roster: null, joiningLocked: false, ...overrides };
}

/** A fetch mock that answers by route: join info (GET) and join (POST). */
export function stubApi(routes: { info?: [number, unknown]; join?: [number, unknown] } = {}) {
  const info = routes.info ?? [200, joinInfo()];
  const join = routes.join ?? [200, joinSuccess()];
  const fetchMock = vi.fn(async (_input: string, init?: RequestInit) => {
    const [status, body] = init?.method === 'POST' ? join : info;
    return jsonResponse(status, body);
  });
  vi.stubGlobal('fetch', fetchMock);
  return {
    fetchMock,
    joinCalls: () => fetchMock.mock.calls.filter(([, init]) => init?.method === 'POST'),
  };
}

// ---------------------------------------------------------------- live session

export const ME = 'p-me';

export function team(overrides: Partial<TeamView> = {}): TeamView {
  return {
    id: 't-argon',
    name: 'Argon',
    colour: '#56B4E9',
    pattern: 'stripes',
    members: [
      { playerId: ME, nickname: 'Sam', number: 1, status: 'connected' },
      { playerId: 'p-ada', nickname: 'Ada', number: 2, status: 'connected' },
      { playerId: 'p-kofi', nickname: 'Kofi', number: 3, status: 'away' },
    ],
    ...overrides,
  };
}

export function singleItem(overrides: Partial<PlayerItemView> = {}): PlayerItemView {
  return {
    type: 'single',
    prompt: 'Where do goggles go when you enter the lab?',
    options: [
      { id: 'o-bench', text: 'On the bench' },
      { id: 'o-face', text: 'On your face' },
      { id: 'o-bag', text: 'In your bag' },
    ],
    unitHint: null,
    imageUrl: null,
    ...overrides,
  };
}

export function orderItem(): PlayerItemView {
  return {
    type: 'order',
    prompt: 'Put the spill steps in order.',
    options: [
      { id: 's-tell', text: 'Tell the teacher' },
      { id: 's-stop', text: 'Stop and step back' },
      { id: 's-warn', text: 'Warn people nearby' },
    ],
    unitHint: null,
    imageUrl: null,
  };
}

export function numericItem(): PlayerItemView {
  return {
    type: 'numeric',
    prompt: 'How many moles of NaCl are in 29.2 g?',
    options: [],
    unitHint: 'mol',
    imageUrl: null,
  };
}

export function timing(overrides: Partial<RoundTiming> = {}): RoundTiming {
  return {
    roundIndex: 0,
    status: 'open',
    deadlineAt: 1_000_030_000,
    limitMs: 30_000,
    paused: false,
    serverNow: 1_000_000_000,
    ...overrides,
  };
}

export type RoundPatch = Partial<NonNullable<PlayerSessionView['round']>>;

export function round(overrides: RoundPatch = {}): NonNullable<PlayerSessionView['round']> {
  return {
    timing: timing(),
    item: singleItem(),
    itemCount: 10,
    calledPlayerId: null,
    votes: [],
    yourAnswer: null,
    reveal: null,
    ...overrides,
  };
}

export function sessionView(overrides: Partial<PlayerSessionView> = {}): PlayerSessionView {
  return {
    sessionId: 'sess-1',
    status: 'lobby',
    format: 'solo',
    you: { playerId: ME, nickname: 'Sam', teamId: 't-argon', number: 1 },
    team: team(),
    round: null,
    ownStanding: null,
    standings: [],
    summary: { answered: 0, correct: 0, points: 0, itemCount: 10 },
    serverNow: 1_000_000_000,
    ...overrides,
  };
}

export function reveal(overrides: Partial<PlayerReveal> = {}): PlayerReveal {
  return {
    roundIndex: 0,
    key: { type: 'single', correctOptionId: 'o-face' },
    explanation: 'Goggles stay on from the moment you enter until you leave.',
    you: {
      answered: true,
      response: { type: 'single', optionId: 'o-bench' },
      credit: 0,
      correct: false,
      points: 0,
    },
    team: { answer: { type: 'single', optionId: 'o-face' }, correct: true, points: 420, unity: false },
    ...overrides,
  };
}

export function jsonResponse(status: number, body: unknown): Response {
  return new Response(JSON.stringify(body), {
    status,
    headers: { 'Content-Type': 'application/json' },
  });
}

/** Replaces global fetch with a mock answering every call with the given status and body. */
export function stubFetch(status: number, body: unknown) {
  const fetchMock = vi.fn(async (_input: string, _init?: RequestInit) => jsonResponse(status, body));
  vi.stubGlobal('fetch', fetchMock);
  return fetchMock;
}

/** A fetch that stays pending until `respond` is called, to observe the submitting state. */
export function stubPendingFetch() {
  let respond: (response: Response) => void = () => undefined;
  const fetchMock = vi.fn(
    (_input: string, _init?: RequestInit) =>
      new Promise<Response>((resolve) => {
        respond = resolve;
      }),
  );
  vi.stubGlobal('fetch', fetchMock);
  return { fetchMock, respond: (response: Response) => respond(response) };
}

/** Points jsdom's location at a player-app URL without reloading. */
export function visit(pathAndQuery: string): void {
  window.history.replaceState(null, '', pathAndQuery);
}
