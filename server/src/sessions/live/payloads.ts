import type { ClockSyncPayload, HostCommand, ItemResponse, SubmitAnswerPayload } from '@covalent/shared-types';
import { ANSWER_TEXT_MAX_LENGTH, CLIENT_MESSAGE_ID_MAX_LENGTH } from '../sessions.constants';
import type { SessionItem } from '../entities/session.entity';

/** A refused payload, in the ack's error shape. */
export interface PayloadError {
  ok: false;
  error: 'invalid_payload';
  message: string;
}
export type Parsed<T> = { ok: true; value: T } | PayloadError;

const bad = (message: string): PayloadError => ({ ok: false, error: 'invalid_payload', message });
const good = <T>(value: T): Parsed<T> => ({ ok: true, value });

function isRecord(v: unknown): v is Record<string, unknown> {
  return typeof v === 'object' && v !== null && !Array.isArray(v) && Object.getPrototypeOf(v) === Object.prototype;
}

/** Only these keys (unknown fields are refused, as the REST pipe does with forbidNonWhitelisted). */
function onlyKeys(v: Record<string, unknown>, allowed: readonly string[]): string | null {
  const extra = Object.keys(v).filter((k) => !allowed.includes(k));
  return extra.length ? `Unknown field${extra.length > 1 ? 's' : ''}: ${extra.slice(0, 3).join(', ')}.` : null;
}

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
const MESSAGE_ID = new RegExp(`^[A-Za-z0-9_.:-]{1,${CLIENT_MESSAGE_ID_MAX_LENGTH}}$`);
const isId = (v: unknown): v is string => typeof v === 'string' && v.length > 0 && v.length <= 64;
const isIndex = (v: unknown): v is number => typeof v === 'number' && Number.isInteger(v) && v >= 0 && v < 10_000;

const SIMPLE_COMMANDS = ['start', 'open_round', 'pause', 'resume', 'add_time', 'close_round', 'reveal', 'next', 'end', 'reshuffle'] as const;

export function parseHostCommand(raw: unknown): Parsed<HostCommand> {
  if (!isRecord(raw) || typeof raw.type !== 'string') return bad('A command is an object with a type.');
  const type = raw.type;
  if ((SIMPLE_COMMANDS as readonly string[]).includes(type)) {
    const extra = onlyKeys(raw, ['type']);
    return extra ? bad(extra) : good({ type } as HostCommand);
  }
  switch (type) {
    case 'lock_joining': {
      const extra = onlyKeys(raw, ['type', 'locked']);
      if (extra) return bad(extra);
      if (typeof raw.locked !== 'boolean') return bad('locked must be true or false.');
      return good({ type, locked: raw.locked });
    }
    case 'remove_player': {
      const extra = onlyKeys(raw, ['type', 'playerId']);
      if (extra) return bad(extra);
      if (typeof raw.playerId !== 'string' || !UUID.test(raw.playerId)) return bad('playerId must be a player id.');
      return good({ type, playerId: raw.playerId.toLowerCase() });
    }
    case 'rename_player': {
      const extra = onlyKeys(raw, ['type', 'playerId', 'nickname']);
      if (extra) return bad(extra);
      if (typeof raw.playerId !== 'string' || !UUID.test(raw.playerId)) return bad('playerId must be a player id.');
      if (typeof raw.nickname !== 'string' || raw.nickname.length > 100) return bad('nickname must be text.');
      return good({ type, playerId: raw.playerId.toLowerCase(), nickname: raw.nickname });
    }
    default:
      return { ok: false, error: 'invalid_payload', message: `Unknown command "${type.slice(0, 40)}".` };
  }
}

/** The response's shape, checked against the item being played (its type and its option ids). */
export function parseResponse(raw: unknown, item: SessionItem): Parsed<ItemResponse> {
  if (!isRecord(raw) || typeof raw.type !== 'string') return bad('response must be an object with a type.');
  if (raw.type !== item.type) return bad(`This item takes a ${item.type} answer.`);
  const optionIds = new Set(item.options.map((o) => o.id));
  switch (raw.type) {
    case 'single': {
      const extra = onlyKeys(raw, ['type', 'optionId']);
      if (extra) return bad(extra);
      if (!isId(raw.optionId) || !optionIds.has(raw.optionId)) return bad('optionId must be one of the options.');
      return good({ type: 'single', optionId: raw.optionId });
    }
    case 'multi': {
      const extra = onlyKeys(raw, ['type', 'optionIds']);
      if (extra) return bad(extra);
      const ids = raw.optionIds;
      if (!Array.isArray(ids) || ids.length > optionIds.size || !ids.every((id) => isId(id) && optionIds.has(id))) {
        return bad('optionIds must list some of the options.');
      }
      if (new Set(ids).size !== ids.length) return bad('optionIds lists an option twice.');
      return good({ type: 'multi', optionIds: ids as string[] });
    }
    case 'truefalse': {
      const extra = onlyKeys(raw, ['type', 'value']);
      if (extra) return bad(extra);
      if (typeof raw.value !== 'boolean') return bad('value must be true or false.');
      return good({ type: 'truefalse', value: raw.value });
    }
    case 'order': {
      const extra = onlyKeys(raw, ['type', 'sequence']);
      if (extra) return bad(extra);
      const seq = raw.sequence;
      if (!Array.isArray(seq) || seq.length !== optionIds.size || !seq.every((id) => isId(id) && optionIds.has(id)) || new Set(seq).size !== seq.length) {
        return bad('sequence must list every step once.');
      }
      return good({ type: 'order', sequence: seq as string[] });
    }
    case 'numeric':
    case 'text': {
      const extra = onlyKeys(raw, ['type', 'text']);
      if (extra) return bad(extra);
      if (typeof raw.text !== 'string' || raw.text.length > ANSWER_TEXT_MAX_LENGTH) {
        return bad(`text must be at most ${ANSWER_TEXT_MAX_LENGTH} characters.`);
      }
      // Control characters have no place in an answer (and PostgreSQL text cannot hold U+0000).
      if (/\p{Cc}/u.test(raw.text.replace(/[\t\n]/g, ' '))) return bad('text contains control characters.');
      return good({ type: raw.type, text: raw.text });
    }
    default:
      return bad('Unknown response type.');
  }
}

/** The envelope of answer:submit; the response itself is checked once the item is known. */
export function parseSubmit(raw: unknown): Parsed<Omit<SubmitAnswerPayload, 'response'> & { response: unknown }> {
  if (!isRecord(raw)) return bad('An answer is an object.');
  const extra = onlyKeys(raw, ['clientMessageId', 'roundIndex', 'response', 'lock']);
  if (extra) return bad(extra);
  if (typeof raw.clientMessageId !== 'string' || !MESSAGE_ID.test(raw.clientMessageId)) {
    return bad(`clientMessageId must be 1–${CLIENT_MESSAGE_ID_MAX_LENGTH} letters, digits or _.:-`);
  }
  if (!isIndex(raw.roundIndex)) return bad('roundIndex must be a round number.');
  if (raw.lock !== undefined && typeof raw.lock !== 'boolean') return bad('lock must be true or false.');
  return good({ clientMessageId: raw.clientMessageId, roundIndex: raw.roundIndex, response: raw.response, lock: raw.lock as boolean | undefined });
}

export function parseLock(raw: unknown): Parsed<{ roundIndex: number }> {
  if (!isRecord(raw)) return bad('Expected { roundIndex }.');
  const extra = onlyKeys(raw, ['roundIndex']);
  if (extra) return bad(extra);
  if (!isIndex(raw.roundIndex)) return bad('roundIndex must be a round number.');
  return good({ roundIndex: raw.roundIndex });
}

export function parseClockSync(raw: unknown): Parsed<ClockSyncPayload> {
  if (!isRecord(raw)) return bad('Expected { t0 }.');
  const extra = onlyKeys(raw, ['t0']);
  if (extra) return bad(extra);
  if (typeof raw.t0 !== 'number' || !Number.isFinite(raw.t0)) return bad('t0 must be a number.');
  return good({ t0: raw.t0 });
}

/** session:resync takes an empty object (or nothing). */
export function parseEmpty(raw: unknown): Parsed<Record<string, never>> {
  if (raw === undefined || raw === null) return good({});
  if (!isRecord(raw)) return bad('Expected an empty object.');
  const extra = onlyKeys(raw, []);
  return extra ? bad(extra) : good({});
}
