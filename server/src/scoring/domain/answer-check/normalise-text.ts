const COMBINING_MARKS = /\p{M}/gu;
const DASHES = /[\u2010-\u2015\u2212\uFE63\uFF0D]/g;

/**
 * DESIGN §5 text normalisation, in this order:
 * 1. NFKC: ligatures, full-width forms, circled digits, and sub/superscript digits become plain
 *    characters ("ﬁ" → "fi", "H₂O" → "H2O", "ＡＢＣ" → "ABC", "①" → "1");
 * 2. case fold: upper- then lower-case, which also folds "ß" to "ss" and final sigma;
 * 3. strip diacritics: NFD, drop combining marks, NFC again ("é" → "e"; letters with no
 *    decomposition such as "ø" or "ł" stay as they are);
 * 4. dashes and minus signs become "-"; runs of whitespace become one space; trim.
 */
export function normaliseAnswerText(text: string): string {
  return text
    .normalize('NFKC')
    .toUpperCase()
    .toLowerCase()
    .normalize('NFD')
    .replace(COMBINING_MARKS, '')
    .normalize('NFC')
    .replace(DASHES, '-')
    .replace(/\s+/gu, ' ')
    .trim();
}

export function countLetters(text: string): number {
  return (text.match(/\p{L}/gu) ?? []).length;
}
