import { analyseSession } from './analyse-session';
import { inputFromRows, lsat6Ids, lsat6Input, lsat6Rows, rowTotals, w10Ids, w10Input, w10Rows } from './debrief.fixtures';
import { NotComputedReason } from './figure';
import { kelleyGroupSize, kelleyGroups, maxPossibleDiscrimination, rankByTotal } from './kelley-groups';

describe('kelleyGroupSize', () => {
  it('is round(0.27·N) and at least 1', () => {
    // Kelley (1939) 27% groups via Lopez (1998) RMT 12:1; REFERENCES.md §1: 0.27×10 = 2.7 → 3, 27% of 1000 = 270
    expect(kelleyGroupSize(10)).toBe(3);
    expect(kelleyGroupSize(1000)).toBe(270);
    expect(kelleyGroupSize(2)).toBe(1); // 0.54 → 1
    expect(kelleyGroupSize(1)).toBe(1); // 0.27 → 0, raised to 1
    expect(kelleyGroupSize(30)).toBe(8); // 8.1 → 8
    expect(kelleyGroupSize(24)).toBe(6); // 6.48 → 6
  });
});

describe('kelleyGroups', () => {
  it('breaks W10 boundary ties by examinee id: upper F, H, A and lower D, E, J', () => {
    // REFERENCES.md §1 "Tie handling, small class": A/G tie at 8 on the upper cut, B/C/I/J at 7 on the lower.
    // Our rule: total descending, then id ascending; so A beats G, and J (the largest id at 7) drops into the lower group.
    const examinees = w10Ids().map((examineeId, r) => ({ examineeId, total: rowTotals(w10Rows())[r] }));
    const groups = kelleyGroups(examinees).value;
    expect(groups?.size).toBe(3);
    expect(groups?.upperIds).toEqual(['F', 'H', 'A']);
    expect(groups?.lowerIds).toEqual(['J', 'D', 'E']);
  });

  it('does not depend on the order examinees are listed in', () => {
    // Determinism of the tie rule (common practice)
    const examinees = w10Ids().map((examineeId, r) => ({ examineeId, total: rowTotals(w10Rows())[r] }));
    const reversed = kelleyGroups([...examinees].reverse()).value;
    const rotated = kelleyGroups([...examinees.slice(4), ...examinees.slice(0, 4)]).value;
    expect(reversed).toEqual(kelleyGroups(examinees).value);
    expect(rotated).toEqual(kelleyGroups(examinees).value);
  });

  it('cuts LSAT6 inside tied scores: the upper 270 all scored 5, the lower 270 take 162 of the 237 who scored 3', () => {
    // REFERENCES.md §1 "Tie handling at the 27% cut": 298 scored 5; 3 + 20 + 85 = 108 scored 0–2 [C]
    const totals = rowTotals(lsat6Rows());
    const ids = lsat6Ids();
    const totalOf = new Map(ids.map((id, r) => [id, totals[r]]));
    const groups = kelleyGroups(ids.map((examineeId, r) => ({ examineeId, total: totals[r] }))).value;
    expect(groups?.upperIds.every((id) => totalOf.get(id) === 5)).toBe(true);
    const lowerTotals = (groups?.lowerIds ?? []).map((id) => totalOf.get(id));
    expect(lowerTotals.filter((t) => t !== undefined && t <= 2)).toHaveLength(108);
    expect(lowerTotals.filter((t) => t === 3)).toHaveLength(162);
    // Among the 237 tied at 3, the 162 with the largest ids enter the lower group.
    const threes = ids.filter((id) => totalOf.get(id) === 3).sort();
    expect((groups?.lowerIds ?? []).filter((id) => totalOf.get(id) === 3).sort()).toEqual(threes.slice(237 - 162));
  });

  it('gives every LSAT6 item p(upper) = 1, since the upper group all answered everything right', () => {
    // Follows from the LSAT6 counts (298 with pattern 11111 ≥ 270); D = 1 − p(lower)
    const analysis = analyseSession(lsat6Input());
    analysis.items.forEach((item) => {
      expect(item.upperP.value).toBe(1);
      expect(item.discrimination.value).toBeCloseTo(1 - (item.lowerP.value ?? NaN), 12);
    });
  });

  it('is null with one examinee and when every total is the same', () => {
    // DESIGN.md §6 edge cases: no figure from too little data
    expect(kelleyGroups([{ examineeId: 'a', total: 3 }])).toEqual({
      value: null,
      reason: NotComputedReason.fewerThanTwoExaminees,
    });
    expect(
      kelleyGroups([
        { examineeId: 'a', total: 2 },
        { examineeId: 'b', total: 2 },
      ]),
    ).toEqual({ value: null, reason: NotComputedReason.zeroTotalVariance });
  });
});

describe('rankByTotal', () => {
  it('treats totals equal up to float noise as ties', () => {
    // 0.1 + 0.2 ≠ 0.3 in binary floating point (REFERENCES.md §3 JS pitfalls)
    const ranked = rankByTotal([
      { examineeId: 'b', total: 0.1 + 0.2 },
      { examineeId: 'a', total: 0.3 },
    ]);
    expect(ranked.map((e) => e.examineeId)).toEqual(['a', 'b']);
  });
});

describe('discrimination D', () => {
  it('is p(upper 27%) − p(lower 27%) on a hand example', () => {
    // Kelley (1939) via Lopez (1998) RMT 12:1. 10 examinees with distinct totals → groups of 3.
    // Item Q1 is right for 2 of the top 3 and 1 of the bottom 3: D = 2/3 − 1/3 = 1/3.
    const ids = ['e0', 'e1', 'e2', 'e3', 'e4', 'e5', 'e6', 'e7', 'e8', 'e9'];
    // Column 0 is the item under study; 18 more columns give examinee k 2·(9 − k) points, so totals are distinct.
    const q1 = [1, 1, 0, 1, 0, 1, 0, 0, 1, 0];
    const rows = ids.map((_, k) => [q1[k], ...Array.from({ length: 18 }, (_, j) => (j < 2 * (9 - k) ? 1 : 0))]);
    expect(new Set(rowTotals(rows)).size).toBe(10);
    const analysis = analyseSession(inputFromRows(rows, ids));
    expect(analysis.groups.value?.upperIds).toEqual(['e0', 'e1', 'e2']);
    expect(analysis.groups.value?.lowerIds).toEqual(['e7', 'e8', 'e9']);
    expect(analysis.items[0].upperP.value).toBeCloseTo(2 / 3, 12);
    expect(analysis.items[0].lowerP.value).toBeCloseTo(1 / 3, 12);
    expect(analysis.items[0].discrimination.value).toBeCloseTo(1 / 3, 12);
  });

  it('is negative when the lower group does better (range −1..+1)', () => {
    // Lopez (1998): D ranges from −1 to +1
    const ids = ['a', 'b', 'c', 'd'];
    const rows = [
      [0, 1, 1, 1],
      [0, 1, 1, 0],
      [1, 0, 0, 0],
      [1, 0, 0, 0],
    ];
    const analysis = analyseSession(inputFromRows(rows, ids));
    expect(analysis.items[0].discrimination.value).toBe(-1);
    expect(analysis.items[1].discrimination.value).toBe(1);
  });
});

describe('maxPossibleDiscrimination', () => {
  it('follows Lopez (1998): p/.27 below .27, (1−p)/.27 above .73, else 1', () => {
    // Lopez (1998) RMT 12:1 p.626; p = .924 → 0.2815 (REFERENCES.md §1 [C])
    expect(maxPossibleDiscrimination(0.924)).toBeCloseTo(0.2815, 4);
    expect(maxPossibleDiscrimination(0.1)).toBeCloseTo(0.1 / 0.27, 12);
    expect(maxPossibleDiscrimination(0.5)).toBe(1);
    expect(maxPossibleDiscrimination(0)).toBe(0);
    expect(maxPossibleDiscrimination(1)).toBeCloseTo(0, 12);
  });

  it('is reported per item from its p', () => {
    // LSAT6 Q1 p = .924 (Rizopoulos 2006) → 0.2815 (Lopez 1998)
    expect(analyseSession(lsat6Input()).items[0].maxDiscrimination.value).toBeCloseTo(0.2815, 4);
  });
});

describe('W10 groups in analyseSession', () => {
  it('are the same groups kelleyGroups gives', () => {
    // Consistency between the helper and the session analysis
    expect(analyseSession(w10Input()).groups.value?.upperIds).toEqual(['F', 'H', 'A']);
  });
});
