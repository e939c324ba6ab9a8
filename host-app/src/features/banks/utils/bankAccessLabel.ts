import type { BankDto } from '@covalent/shared-types';

/** Who the bank belongs to, in words: the badge text in the banks table and at the top of a bank. */
export function bankAccessLabel(bank: Pick<BankDto, 'access' | 'ownerName'>): string {
  switch (bank.access) {
    case 'owner':
      return 'Yours';
    case 'edit':
      return `Shared by ${bank.ownerName} · can edit`;
    case 'view':
      return `Shared by ${bank.ownerName} · view only`;
    case 'admin':
      return `${bank.ownerName}'s · school view`;
  }
}

/** Owner and edit shares change items and details. */
export const canEditBank = (access: BankDto['access']): boolean => access === 'owner' || access === 'edit';
