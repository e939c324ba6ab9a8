import type { StaffUserDto } from '@covalent/shared-types';

export type StaffStatus = 'active' | 'invited' | 'deactivated';

/** Deactivation wins over everything; an account is "invited" until its password is set. */
export function staffStatus(user: Pick<StaffUserDto, 'active' | 'activated'>): StaffStatus {
  if (!user.active) return 'deactivated';
  return user.activated ? 'active' : 'invited';
}
