import { englishDataset, englishRecommendedTransformers, RegExpMatcher } from 'obscenity';
import { NICKNAME_MAX_LENGTH } from './sessions.constants';

const matcher = new RegExpMatcher({ ...englishDataset.build(), ...englishRecommendedTransformers });

export type NicknameCheck = { ok: true; nickname: string; key: string } | { ok: false; error: string; message: string };

/** Case-, width- and accent-insensitive key: "Ana", "ANA" and "Ａｎａ" are the same nickname. */
export function nicknameKey(nickname: string): string {
  return nickname.normalize('NFKC').toLowerCase().replace(/\s+/g, ' ');
}

/** Trimmed, 1–20 characters, printable, and not offensive (obscenity's English dataset). */
export function checkNickname(input: unknown): NicknameCheck {
  if (typeof input !== 'string') return { ok: false, error: 'invalid_nickname', message: 'Type a nickname.' };
  const nickname = input.normalize('NFKC').replace(/\s+/g, ' ').trim();
  if (nickname.length === 0) return { ok: false, error: 'invalid_nickname', message: 'Type a nickname.' };
  if ([...nickname].length > NICKNAME_MAX_LENGTH) {
    return { ok: false, error: 'invalid_nickname', message: `A nickname is at most ${NICKNAME_MAX_LENGTH} characters.` };
  }
  // Control and format characters (incl. bidi overrides) would let one name look like another.
  if (/[\p{Cc}\p{Cf}]/u.test(nickname)) {
    return { ok: false, error: 'invalid_nickname', message: 'Use letters, numbers and ordinary punctuation.' };
  }
  if (matcher.hasMatch(nickname)) {
    return { ok: false, error: 'nickname_not_allowed', message: 'That nickname is not allowed. Choose a different one.' };
  }
  return { ok: true, nickname, key: nicknameKey(nickname) };
}
