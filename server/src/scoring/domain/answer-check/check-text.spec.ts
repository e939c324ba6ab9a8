import fc from 'fast-check';
import leven from 'leven';
import { checkAnswer } from './check-answer';
import { editDistance, isOneTypoAway } from './check-text';
import { textItem } from './answer-check.factories';

const answer = (accepted: string[], text: string, typoTolerance = true) =>
  checkAnswer(textItem(accepted, typoTolerance), { type: 'text', text });

describe('editDistance', () => {
  // Levenshtein (1965); Wikipedia "Levenshtein distance" example, kitten → sitting = 3 (from memory,
  // also read in copies of the article's text).
  it('gives 3 for kitten and sitting', () => {
    expect(editDistance('kitten', 'sitting')).toBe(3);
  });

  // leven@3, an independent implementation (dev dependency), on random strings.
  it('agrees with leven on random strings', () => {
    fc.assert(
      fc.property(fc.string({ maxLength: 20 }), fc.string({ maxLength: 20 }), (a, b) => editDistance(a, b) === leven(a, b)),
      { numRuns: 500 },
    );
  });

  it('agrees with leven on near-identical strings from a small alphabet', () => {
    const small = fc.string({ unit: fc.constantFrom('a', 'b', 'c'), maxLength: 10 });
    fc.assert(fc.property(small, small, (a, b) => editDistance(a, b) === leven(a, b)), { numRuns: 500 });
  });
});

describe('isOneTypoAway', () => {
  // DESIGN.md §5: within edit distance 1 for answers of 5+ letters; checked against leven.
  it('matches leven distance 1 for accepted answers of 5+ letters with the same digits', () => {
    // Letters and digits, so both of the rule's conditions (5+ letters, digits unchanged) are met and missed.
    const unit = fc.constantFrom('a', 'b', 'c', 'd', 'e', '2', '3');
    const word = fc.string({ unit, minLength: 3, maxLength: 9 });
    const edit = fc.string({ unit, minLength: 2, maxLength: 10 });
    const letters = (s: string) => s.replace(/[^a-e]/g, '').length;
    const digits = (s: string) => s.replace(/[^23]/g, '');
    fc.assert(
      fc.property(
        word,
        edit,
        (accepted, typed) =>
          isOneTypoAway(accepted, typed) ===
          (letters(accepted) >= 5 && digits(accepted) === digits(typed) && leven(accepted, typed) === 1),
      ),
      { numRuns: 2000 },
    );
    // NaHCO3 → NaHCO2 is one edit but another compound (the digits rule).
    expect(isOneTypoAway('nahco3', 'nahco2')).toBe(false);
    expect(isOneTypoAway('nahco3', 'nahcoo3')).toBe(true);
  });
});

describe('checkAnswer (text)', () => {
  it('gives 1 exact for a normalised match with any accepted answer', () => {
    expect(answer(['sodium chloride', 'NaCl'], '  Sodium   CHLORIDE ')).toEqual({ credit: 1, correct: true, detail: 'exact' });
    expect(answer(['sodium chloride', 'NaCl'], 'nacl').detail).toBe('exact');
    expect(answer(['H2O'], 'H₂O').detail).toBe('exact'); // DESIGN.md §5: sub/superscript digits
    expect(answer(['protéine'], 'PROTEINE').detail).toBe('exact'); // diacritics
  });

  it('gives 1 typo for one edit on an answer of 5+ letters', () => {
    expect(answer(['ethanol'], 'ethanl')).toEqual({ credit: 1, correct: true, detail: 'typo' }); // deletion
    expect(answer(['ethanol'], 'ethanoll').detail).toBe('typo'); // insertion
    expect(answer(['ethanol'], 'ethenol').detail).toBe('typo'); // substitution
    expect(answer(['water'], 'watr').detail).toBe('typo'); // exactly 5 letters
  });

  it('gives no typo credit for answers under 5 letters', () => {
    expect(answer(['iron'], 'irn')).toEqual({ credit: 0, correct: false, detail: 'wrong' });
    expect(answer(['neon'], 'neo').detail).toBe('wrong');
    expect(answer(['H2O'], 'H3O').detail).toBe('wrong');
  });

  it('gives no typo credit for two edits, or when typo tolerance is off', () => {
    expect(answer(['ethanol'], 'etanl').detail).toBe('wrong');
    expect(answer(['ethanol'], 'ethanl', false).detail).toBe('wrong');
  });

  // Our guard: a changed digit is a different formula or number, not a typo.
  it('gives no typo credit when the edit changes a digit', () => {
    expect(answer(['NaHCO3'], 'NaHCO2').detail).toBe('wrong');
    expect(answer(['NaHCO3'], 'NaHC03').detail).toBe('wrong'); // letter O typed as zero
    expect(answer(['NaHCO3'], 'NaHCO3 ').detail).toBe('exact');
  });

  it('gives no_answer for empty text', () => {
    expect(answer(['ethanol'], '   ').detail).toBe('no_answer');
  });
});
