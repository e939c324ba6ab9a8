import type { MeDto } from '@covalent/shared-types';
import { useContext } from 'react';
import { CurrentUserContext } from '../utils/CurrentUserContext';

/** The signed-in user, for components rendered under `RequireSignedIn`. */
export function useCurrentUser(): MeDto {
  const me = useContext(CurrentUserContext);
  if (!me) throw new Error('useCurrentUser is only for pages behind RequireSignedIn.');
  return me;
}
