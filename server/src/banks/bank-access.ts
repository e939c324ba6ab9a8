import type { BankAccess } from '@covalent/shared-types';

/** What a request needs to do to a bank. */
export type BankNeed = 'read' | 'edit' | 'own';

/**
 * Owner: everything. Edit share: items and details, not delete/share/archive.
 * View share and same-school admin: read only.
 */
export function allows(access: BankAccess, need: BankNeed): boolean {
  if (need === 'read') return true;
  if (need === 'edit') return access === 'owner' || access === 'edit';
  return access === 'owner';
}
