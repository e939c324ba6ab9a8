import type { Role } from '@covalent/shared-types';
import { routes } from '@/routes';

export interface ShellNavItem {
  label: string;
  to: string;
}

/** The top-bar sections a role may open; Staff is for school administrators only. */
export function shellNavItems(role: Role): ShellNavItem[] {
  const items: ShellNavItem[] = [
    { label: 'Classes', to: routes.classes.build() },
    { label: 'Banks', to: routes.banks.build() },
    { label: 'Sessions', to: routes.sessions.build() },
    { label: 'Debriefs', to: routes.debriefs.build() },
  ];
  if (role === 'admin') items.push({ label: 'Staff', to: routes.adminStaff.build() });
  return items;
}
