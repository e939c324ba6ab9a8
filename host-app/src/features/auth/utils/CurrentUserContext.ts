import type { MeDto } from '@covalent/shared-types';
import { createContext } from 'react';

/**
 * The user `RequireSignedIn` rendered its pages for. Pages read it from here rather than
 * from the query, so a page never renders in the instant after sign-out clears the cache.
 */
export const CurrentUserContext = createContext<MeDto | null>(null);
