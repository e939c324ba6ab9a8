import { buildDebrief, buildDebriefInput, needsRevisit } from './debrief-builder';
import { emptySource, player, singleItem, w10Source } from './debrief.factories';
import { analyseSession } from './domain';
import { w10Ids, w10Rows } from './domain/debrief.fixtures';

describe('buildDebrief', () => {
  it('reproduces W10 item difficulties and KR-20 from a played solo session', () => {
    // Wuensch, "The Kuder-Richardson 20" (KR20.txt): p per item; KR-20 = 10/9·(1 − 2.18/5.84) = 0.69635 (REFERENCES.md §1).
    const { dto } = buildDebrief(w10Source());
    expect(dto.items.map((i) => i.p.value)).toEqual([0.7, 0.7, 0.6, 0.7, 0.6, 0.8, 0.7, 0.7, 0.5, 0.6].map((p) => expect.closeTo(p, 10)));
    expect(dto.reliability).toMatchObject({ method: 'kr20', value: { value: expect.closeTo(0.69635, 5) } });
    // Totals 8 7 7 2 2 9 8 9 7 7 (Wuensch) → percent = total/10 items.
    const byName = new Map(dto.students.map((s) => [s.nickname, s.percent.value]));
    expect(w10Ids().map((id) => byName.get(`Nick ${id}`))).toEqual([80, 70, 70, 20, 20, 90, 80, 90, 70, 70].map((v) => expect.closeTo(v, 10)));
    // Mean total 6.6 of 10 (Wuensch) → class accuracy 0.66.
    expect(dto.classAccuracy.value).toBeCloseTo(0.66, 10);
  });

  it('passes analyseSession the same matrix the session stored (every figure equal)', () => {
    const source = w10Source();
    const { dto, analysis } = buildDebrief(source);
    const direct = analyseSession({
      items: source.items.map((i) => ({ id: i.id, optionIds: i.options.map((o) => o.id), correctOptionIds: [`${i.id}-b`], dichotomous: true })),
      examinees: w10Ids().map((id) => ({ id })),
      responses: w10Ids().flatMap((id, r) =>
        w10Rows()[r].map((credit, i) => ({ examineeId: id, itemId: `Q${i + 1}`, credit, answered: true, chosenOptionIds: [`Q${i + 1}-${credit ? 'b' : 'a'}`] })),
      ),
      teams: [],
      teamRounds: [],
    });
    expect(analysis).toEqual(direct);
    expect(dto.items.map((i) => i.D)).toEqual(direct.items.map((i) => i.discrimination));
    expect(dto.items.map((i) => i.pointBiserial)).toEqual(direct.items.map((i) => i.pointBiserial));
  });

  it('labels distractor rows with letters and option text, the key marked', () => {
    const { dto } = buildDebrief(w10Source());
    const rows = dto.items[0].distractors.value?.rows ?? [];
    expect(rows.map((r) => [r.letter, r.text, r.isKey])).toEqual([
      ['A', 'Beaker', false],
      ['B', 'Volumetric pipette', true],
      ['C', 'Conical flask', false],
    ]);
    // Q1: 7 of 10 chose the key, 3 chose A, nobody C (W10 column 1).
    expect(rows.map((r) => r.overall)).toEqual([0.3, 0.7, 0].map((v) => expect.closeTo(v, 10)));
    expect(rows[2].nonFunctional).toBe(true); // chosen by under 5 % (Haladyna & Downing 1993, from memory; DESIGN.md §6)
    expect(dto.items[0].keyText).toBe('B. Volumetric pipette');
  });

  it('counts a deleted student as removed and leaves them out of every figure', () => {
    const source = w10Source();
    source.players = source.players.map((p) => (p.id === 'D' ? { ...p, deleted: true } : p));
    source.responses = source.responses.filter((r) => r.playerId !== 'D');
    const { dto } = buildDebrief(source);
    expect(dto).toMatchObject({ playerCount: 9, removedCount: 1 });
    // Q1 without D (who had 0): 7 of 9.
    expect(dto.items[0].p.value).toBeCloseTo(7 / 9, 10);
    const removed = dto.students.find((s) => s.playerId === 'D');
    expect(removed).toMatchObject({ removed: true, score: null, percent: { value: null }, missed: [] });
    expect(dto.students[dto.students.length - 1].playerId).toBe('D');
  });

  it('uses team submissions as the unit in numbered (DESIGN.md §6) and gives each member the team figures', () => {
    const item = singleItem('Q1');
    const source = emptySource({
      session: { ...emptySource().session, format: 'numbered' },
      items: [item, singleItem('Q2')],
      teams: [{ id: 't1', name: 'Argon' }, { id: 't2', name: 'Boron' }],
      players: [player('p1', { teamId: 't1' }), player('p2', { teamId: 't1' }), player('p3', { teamId: 't2' })],
      responses: [
        { playerId: 'p1', teamId: 't1', itemId: 'Q1', response: { type: 'single', optionId: 'Q1-b' }, credit: 1 },
        { playerId: 'p2', teamId: 't1', itemId: 'Q2', response: { type: 'single', optionId: 'Q2-a' }, credit: 0 },
        { playerId: 'p3', teamId: 't2', itemId: 'Q1', response: { type: 'single', optionId: 'Q1-a' }, credit: 0 },
      ],
      teamRounds: [{ teamId: 't1', itemId: 'Q1', points: 900, correct: true, correctShare: 1, unity: false }],
    });
    const input = buildDebriefInput(source);
    expect(input.examinees).toEqual([{ id: 't1' }, { id: 't2' }]);
    const { dto } = buildDebrief(source);
    expect(dto.unit).toBe('team');
    expect(dto.items[0].p.value).toBe(0.5); // t1 right, t2 wrong
    const p2 = dto.students.find((s) => s.playerId === 'p2');
    expect(p2).toMatchObject({ score: 1, percent: { value: 50 }, answered: 2 });
    expect(p2?.missed.map((m) => [m.itemId, m.answerText, m.keyText])).toEqual([['Q2', 'A. Beaker', 'B. Volumetric pipette']]);
    expect(dto.teams.map((t) => [t.name, t.points, t.accuracy.value, t.memberCount])).toEqual([
      ['Argon', 900, 0.5, 2],
      ['Boron', 0, 0, 1],
    ]);
  });

  it('answers "not enough data" reasons instead of numbers for a session nobody joined', () => {
    const { dto } = buildDebrief(emptySource({ items: [singleItem('Q1')] }));
    expect(dto.classAccuracy).toEqual({ value: null, reason: expect.any(String) });
    expect(dto.reliability.value.value).toBeNull();
    expect(dto.items[0].p.value).toBeNull();
  });

  it('leaves out players the host removed before they answered, keeps those who answered', () => {
    const source = w10Source();
    source.players.push(player('Z', { removedByHost: true }));
    expect(buildDebrief(source).dto.playerCount).toBe(10);
  });
});

describe('needsRevisit', () => {
  it('lists items under 0.70 (common practice) and never a null p', () => {
    expect(needsRevisit({ value: 0.69, reason: null })).toBe(true);
    expect(needsRevisit({ value: 0.7, reason: null })).toBe(false);
    expect(needsRevisit({ value: null, reason: 'x' })).toBe(false);
  });
});
