import { accuracyByTag, TaggedSession } from './accuracy-by-tag';
import { DebriefInputError } from './debrief-input';
import { NotComputedReason } from './figure';

const SESSIONS: TaggedSession[] = [
  {
    sessionId: 's2',
    endedAt: '2025-09-10T10:00:00Z',
    items: [
      { tags: ['lab-safety'], p: 0.9 },
      { tags: ['lab-safety', 'entry'], p: 0.5 },
    ],
  },
  {
    sessionId: 's1',
    endedAt: '2025-09-03T10:00:00+02:00',
    items: [
      { tags: ['lab-safety'], p: 0.4 },
      { tags: ['entry', 'entry'], p: null },
    ],
  },
];

describe('accuracyByTag', () => {
  const series = accuracyByTag(SESSIONS);

  it('gives one series per tag in code-unit order', () => {
    // Deterministic order for the class page chart (common practice)
    expect(series.map((s) => s.tag)).toEqual(['entry', 'lab-safety']);
  });

  it('orders each series by session end time and averages item p within a session', () => {
    // DESIGN.md §6 "per class over time: accuracy by tag across sessions"; mean of p is hand-computed
    const lab = series[1];
    expect(lab.points.map((p) => p.sessionId)).toEqual(['s1', 's2']);
    expect(lab.points[0].accuracy.value).toBeCloseTo(0.4, 12);
    expect(lab.points[1].accuracy.value).toBeCloseTo(0.7, 12);
    expect(lab.points[1].itemCount).toBe(2);
  });

  it('gives null accuracy where no item of the tag was answered, and counts a repeated tag once', () => {
    // An item nobody answered has p = null (brief); null is shown as "not enough data"
    const entry = series[0];
    expect(entry.points[0]).toEqual({
      sessionId: 's1',
      endedAt: '2025-09-03T10:00:00+02:00',
      itemCount: 1,
      accuracy: { value: null, reason: NotComputedReason.nobodyAnswered },
    });
    expect(entry.points[1].accuracy.value).toBeCloseTo(0.5, 12);
  });

  it('compares end times as instants, not as strings', () => {
    // ISO 8601 offsets: 10:00+02:00 is 08:00Z, before 09:00Z although it sorts after as text
    const result = accuracyByTag([
      { sessionId: 'late', endedAt: '2025-09-03T09:00:00Z', items: [{ tags: ['t'], p: 1 }] },
      { sessionId: 'early', endedAt: '2025-09-03T10:00:00+02:00', items: [{ tags: ['t'], p: 0 }] },
    ]);
    expect(result[0].points.map((p) => p.sessionId)).toEqual(['early', 'late']);
  });

  it('refuses an end time that is not a date', () => {
    // Input contract (common practice)
    expect(() => accuracyByTag([{ sessionId: 'x', endedAt: 'yesterday', items: [] }])).toThrow(DebriefInputError);
  });

  it('is empty for no sessions', () => {
    expect(accuracyByTag([])).toEqual([]);
  });
});
