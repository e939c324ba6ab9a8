import type { ItemContent } from './items';

/** How the signed-in user may use a bank: owner, an edit or view share, or a same-school admin (read-only). */
export const BANK_ACCESS = ['owner', 'edit', 'view', 'admin'] as const;
/** One of {@link BANK_ACCESS}. */
export type BankAccess = (typeof BANK_ACCESS)[number];

/** What a co-teacher may do with a shared bank. */
export const SHARE_ACCESS = ['view', 'edit'] as const;
/** One of {@link SHARE_ACCESS}. */
export type ShareAccess = (typeof SHARE_ACCESS)[number];

/** Sort keys of `GET /api/banks?sort=`. */
export const BANK_SORTS = ['title', 'updatedAt', 'itemCount'] as const;
/** One of {@link BANK_SORTS}. */
export type BankSort = (typeof BANK_SORTS)[number];

/** A bank in a list or at the top of its page. */
export interface BankDto {
  id: string;
  ownerId: string;
  ownerName: string;
  title: string;
  description: string;
  tags: string[];
  standardsCode: string | null;
  /** ISO time, or null while the bank is in use. */
  archivedAt: string | null;
  itemCount: number;
  access: BankAccess;
  createdAt: string;
  updatedAt: string;
}

/** A co-teacher a bank is shared with. */
export interface BankShareDto {
  userId: string;
  displayName: string;
  email: string;
  access: ShareAccess;
}

/** A bank with its items (and, for its owner, its shares). */
export interface BankDetailDto extends BankDto {
  items: ItemDto[];
  shares: BankShareDto[];
}

/** An item as the author keeps it, with its place in the bank. */
export interface ItemDto extends ItemContent {
  id: string;
  bankId: string;
  /** 0-based place in the bank's order. */
  position: number;
  createdAt: string;
  updatedAt: string;
}

/** The answer to a successful CSV import. */
export interface ImportResultDto {
  /** The bank or class the rows went into. */
  targetId: string;
  imported: number;
}

/** An uploaded image, ready to attach to an item by `id`. */
export interface MediaDto {
  id: string;
  mime: 'image/png' | 'image/jpeg' | 'image/webp';
  byteSize: number;
  sha256: string;
  /** Where a signed-in browser fetches it. */
  url: string;
}

/** Extended-time multipliers a roster entry may carry (DESIGN.md §4). */
export const TIME_MULTIPLIERS = [1, 1.25, 1.5, 2] as const;
/** One of {@link TIME_MULTIPLIERS}. */
export type TimeMultiplier = (typeof TIME_MULTIPLIERS)[number];

/** How the signed-in user may use a class: owner, co-teacher (read, run sessions) or same-school admin (read). */
export const CLASS_ACCESS = ['owner', 'co-teacher', 'admin'] as const;
/** One of {@link CLASS_ACCESS}. */
export type ClassAccess = (typeof CLASS_ACCESS)[number];

/** A teacher added to a class. */
export interface CoTeacherDto {
  userId: string;
  displayName: string;
  email: string;
}

/** A class period/section. */
export interface ClassDto {
  id: string;
  ownerId: string;
  ownerName: string;
  name: string;
  period: string;
  term: string;
  archivedAt: string | null;
  rosterCount: number;
  coTeachers: CoTeacherDto[];
  access: ClassAccess;
  createdAt: string;
  updatedAt: string;
}

/**
 * A class named in one line, as lists and headers show it: "Chemistry · period 5", or just the
 * name when no period is set. Two periods of one course share a name, so the period tells them apart.
 */
export function classLabel(cls: { name: string; period?: string | null }): string {
  // Periods are free text: "3", "P3", "Period 3" all read "period 3"; "B-block" stays as it is.
  const period = cls.period?.trim().replace(/^(period\s*|p(?=\d))/i, '');
  if (!period) return cls.name;
  return /^\d/.test(period) ? `${cls.name} · period ${period}` : `${cls.name} · ${period}`;
}

/** A student in a class. */
export interface RosterEntryDto {
  id: string;
  classId: string;
  displayName: string;
  /** A table label such as "3" or "B", or null when seating is free. */
  tableGroup: string | null;
  seatNumber: number | null;
  timeMultiplier: TimeMultiplier;
}

/** Keep-apart / keep-together rules the Mixer honours. */
export const PAIR_KINDS = ['apart', 'together'] as const;
/** One of {@link PAIR_KINDS}. */
export type PairKind = (typeof PAIR_KINDS)[number];

/** A rule about two roster entries of one class. */
export interface PairRuleDto {
  id: string;
  classId: string;
  kind: PairKind;
  entryAId: string;
  entryBId: string;
}

/** A class with its roster and pair rules. */
export interface ClassDetailDto extends ClassDto {
  roster: RosterEntryDto[];
  pairs: PairRuleDto[];
}
