import { invalidJoinCodeCharacters, JOIN_CODE_LENGTH, normaliseJoinCode } from './joinCode';

export const NICKNAME_MAX_LENGTH = 20;

/**
 * Letters and digits of any script (with combining marks), spaces and a little punctuation.
 * No "@", so an e-mail address cannot be typed as a nickname (DESIGN.md §9).
 */
const NICKNAME_PATTERN = /^[\p{L}\p{M}\p{N} .,'’_!?-]+$/u;

export interface JoinFormValues {
  code: string;
  nickname: string;
}

export interface JoinFieldErrors {
  code?: string;
  nickname?: string;
}

export type JoinValidation =
  | { ok: true; values: JoinFormValues }
  | { ok: false; errors: JoinFieldErrors };

/** Trims and collapses runs of whitespace, so "  Sam   J " becomes "Sam J". */
export function normaliseNickname(raw: string): string {
  return raw.trim().replace(/\s+/g, ' ');
}

/** Counts characters as people see them, so "Zoë" is 3 even when typed as e + combining mark. */
function visibleLength(text: string): number {
  return [...text.normalize('NFC')].length;
}

export function validateJoinCode(raw: string): string | undefined {
  const code = normaliseJoinCode(raw);
  if (code.length === 0) return 'Enter the join code shown on the board.';
  const bad = invalidJoinCodeCharacters(code);
  if (bad.length > 0) {
    return `Join codes never use 0, O, 1, I or L, or symbols. Check "${bad.join(' ')}" against the board.`;
  }
  if (code.length !== JOIN_CODE_LENGTH) {
    return `A join code has ${JOIN_CODE_LENGTH} characters; this one has ${code.length}.`;
  }
  return undefined;
}

export function validateNickname(raw: string): string | undefined {
  const nickname = normaliseNickname(raw);
  if (nickname.length === 0) return 'Enter a nickname.';
  if (visibleLength(nickname) > NICKNAME_MAX_LENGTH) {
    return `Keep it to ${NICKNAME_MAX_LENGTH} characters or fewer.`;
  }
  if (!NICKNAME_PATTERN.test(nickname)) {
    return 'Use letters, numbers, spaces and simple punctuation only.';
  }
  return undefined;
}

/** Checks both fields; on success returns the values as they should be sent. */
export function validateJoin(input: JoinFormValues): JoinValidation {
  const errors: JoinFieldErrors = {
    code: validateJoinCode(input.code),
    nickname: validateNickname(input.nickname),
  };
  if (errors.code || errors.nickname) {
    return { ok: false, errors: stripUndefined(errors) };
  }
  return {
    ok: true,
    values: {
      code: normaliseJoinCode(input.code),
      nickname: normaliseNickname(input.nickname).normalize('NFC'),
    },
  };
}

function stripUndefined(errors: JoinFieldErrors): JoinFieldErrors {
  const out: JoinFieldErrors = {};
  if (errors.code) out.code = errors.code;
  if (errors.nickname) out.nickname = errors.nickname;
  return out;
}
