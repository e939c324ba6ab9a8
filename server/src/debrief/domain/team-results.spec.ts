import { analyseSession } from './analyse-session';
import { DebriefInput, DebriefInputError } from './debrief-input';
import { answer, openItem } from './debrief.fixtures';
import { NotComputedReason } from './figure';

function teamSession(overrides: Partial<DebriefInput> = {}): DebriefInput {
  return {
    items: [openItem('Q1'), openItem('Q2'), openItem('Q3'), openItem('Q4')],
    examinees: [{ id: 'a' }, { id: 'b' }, { id: 'c' }, { id: 'd', removed: true }],
    responses: [answer('a', 'Q1', 1)],
    teams: [
      { id: 'argon', memberIds: ['a', 'b', 'd'] },
      { id: 'boron', memberIds: ['c'] },
    ],
    teamRounds: [
      { teamId: 'argon', itemId: 'Q1', points: 1100, correct: true, unity: true },
      { teamId: 'argon', itemId: 'Q2', points: 500, correct: true, unity: false },
      { teamId: 'argon', itemId: 'Q3', points: 0, correct: false, unity: false },
      { teamId: 'boron', itemId: 'Q1', points: 900, correct: true, unity: true },
    ],
    ...overrides,
  };
}

describe('team results', () => {
  it('sums points and gives accuracy and unity rate over the rounds played', () => {
    // DESIGN.md §6 per team: points, accuracy, unity rate. Four rounds played; a round with no row scored nothing.
    const [argon, boron] = analyseSession(teamSession()).teams;
    expect(argon).toMatchObject({ teamId: 'argon', points: 1600, roundCount: 4, correctRounds: 2, unityRounds: 1 });
    expect(argon.accuracy.value).toBe(0.5);
    expect(argon.unityRate.value).toBe(0.25);
    expect(boron).toMatchObject({ points: 900, correctRounds: 1 });
    expect(boron.accuracy.value).toBe(0.25);
  });

  it('leaves removed examinees out of the member list', () => {
    // Brief: removed examinees appear in no figure
    expect(analyseSession(teamSession()).teams[0].memberIds).toEqual(['a', 'b']);
  });

  it('gives null rates when no rounds were played', () => {
    // Share of zero rounds is undefined (DESIGN.md §6 edge cases)
    const [argon] = analyseSession(teamSession({ items: [], responses: [], teamRounds: [] })).teams;
    expect(argon.accuracy).toEqual({ value: null, reason: NotComputedReason.noItems });
    expect(argon.points).toBe(0);
  });

  it('is empty when the session has no teams', () => {
    // solo sessions may pass no teams
    expect(analyseSession(teamSession({ teams: undefined, teamRounds: undefined })).teams).toEqual([]);
  });

  it('refuses a round of an unknown team, a duplicate round, or an unknown member', () => {
    // Input contract (common practice: fail loudly on caller bugs)
    const unknownTeam = teamSession({ teamRounds: [{ teamId: 'neon', itemId: 'Q1', points: 0, correct: false, unity: false }] });
    expect(() => analyseSession(unknownTeam)).toThrow(DebriefInputError);
    const round = { teamId: 'boron', itemId: 'Q1', points: 0, correct: false, unity: false };
    expect(() => analyseSession(teamSession({ teamRounds: [round, round] }))).toThrow(/duplicate round/);
    expect(() => analyseSession(teamSession({ teams: [{ id: 'x', memberIds: ['nobody'] }] }))).toThrow(/unknown member/);
  });
});
