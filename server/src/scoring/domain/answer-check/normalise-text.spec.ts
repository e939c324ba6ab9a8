import { normaliseAnswerText } from './normalise-text';

describe('normaliseAnswerText', () => {
  // Unicode UAX #15 compatibility-equivalence examples (ligatures, sub/superscripts, width and
  // circled variants); the pairs are from memory of the annex's figure, and match the summary
  // "super/subscript ('²' -> '2') … ('fi' -> 'f' 'i')" in the Pike Unicode.normalize docs citing UAX #15.
  it.each([
    ['ﬁ', 'fi'], // U+FB01 LATIN SMALL LIGATURE FI
    ['H₂O', 'h2o'], // subscript two U+2082
    ['x²', 'x2'], // superscript two U+00B2
    ['ＡＢＣ', 'abc'], // full-width Latin capitals
    ['①', '1'], // circled digit one U+2460
    ['ℌ', 'h'], // font variant, black-letter H U+210C
  ])('folds %s to %s (NFKC, then case fold)', (input, expected) => {
    expect(normaliseAnswerText(input)).toBe(expected);
  });

  // The same examples straight through the runtime's NFKC, so a change in ICU data would show.
  it('relies on NFKC for these compatibility mappings', () => {
    expect('ﬁ ＡＢＣ ① H₂O'.normalize('NFKC')).toBe('fi ABC 1 H2O');
  });

  it('strips diacritics, composed or decomposed', () => {
    expect(normaliseAnswerText('Café')).toBe('cafe');
    expect(normaliseAnswerText('Cafe\u0301')).toBe('cafe'); // e + COMBINING ACUTE ACCENT
    expect(normaliseAnswerText('Ångström')).toBe('angstrom');
    expect(normaliseAnswerText('naïve')).toBe('naive');
  });

  // Unicode CaseFolding.txt: ß folds to "ss" under full case folding (from memory).
  it('case-folds beyond toLowerCase', () => {
    expect(normaliseAnswerText('SODIUM Chloride')).toBe('sodium chloride');
    expect(normaliseAnswerText('Straße')).toBe('strasse');
    expect(normaliseAnswerText('STRASSE')).toBe(normaliseAnswerText('straße'));
  });

  it('collapses whitespace, including no-break and tab, and trims', () => {
    expect(normaliseAnswerText('  sodium \t\u00A0 chloride\n')).toBe('sodium chloride');
  });

  it('maps dashes and the minus sign to a hyphen', () => {
    expect(normaliseAnswerText('sp\u2013hybrid')).toBe('sp-hybrid');
    expect(normaliseAnswerText('SO₄²⁻')).toBe('so42-'); // superscript minus → U+2212 under NFKC → "-"
  });
});
