import type { StoredSnapshot } from '../sessions/live/snapshot-codec';
import { scrubSnapshot } from './scrub-snapshot';

function snapshot(): StoredSnapshot {
  const answer = (playerId: string) => ({ playerId, teamId: 't1', response: { type: 'truefalse', value: true }, choice: 'x', changedAt: 0, elapsedMs: 0, locked: true });
  const result = (playerId: string) => ({ roundIndex: 0, itemId: 'i1', playerId, teamId: 't1', answered: true, response: null, credit: 1, correct: true, points: 1000, elapsedMs: 0, limitMs: 30000 });
  return {
    acceptances: [
      { playerId: 'p1', clientMessageId: 'a', roundIndex: 0, acceptedAt: 0, locked: true },
      { playerId: 'p2', clientMessageId: 'b', roundIndex: 0, acceptedAt: 0, locked: true },
    ],
    rounds: [
      {
        answers: [answer('p1'), answer('p2')],
        voteLog: [{ seq: 1, teamId: 't1', playerId: 'p1', from: null, to: 'x', at: 0 }],
        results: { players: [result('p1'), result('p2')], teams: [{ teamId: 't1', points: 1000 }] },
      },
    ],
  } as unknown as StoredSnapshot;
}

describe('scrubSnapshot', () => {
  it("drops the players' answers, votes, results and acceptances and keeps the team results", () => {
    const out = scrubSnapshot(snapshot(), new Set(['p1']));
    const round = out.rounds[0];
    expect(round.answers.map((a) => a.playerId)).toEqual(['p2']);
    expect(round.voteLog).toEqual([]);
    expect(round.results?.players.map((p) => p.playerId)).toEqual(['p2']);
    expect(round.results?.teams).toHaveLength(1);
    expect((out.acceptances as { playerId: string }[]).map((a) => a.playerId)).toEqual(['p2']);
    expect(JSON.stringify(out)).not.toContain('"p1"');
  });
});
