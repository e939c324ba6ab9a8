const id = (value: string): string => encodeURIComponent(value);

/** Adds a query string, leaving out empty values. */
function withQuery(path: string, query: Record<string, string | undefined>): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query)) {
    if (value !== undefined && value !== '') params.set(key, value);
  }
  const search = params.toString();
  return search ? `${path}?${search}` : path;
}

/** Query of `GET /api/banks`. */
export interface BankListQuery {
  q?: string;
  tag?: string;
  archived?: 'true' | 'false' | 'all';
  sort?: 'title' | 'updatedAt' | 'itemCount';
  dir?: 'asc' | 'desc';
}

/** REST endpoints of the Covalent server, relative to the app's origin (Vite proxies `/api`). */
export const apiPaths = {
  me: '/api/me',
  signIn: '/api/auth/sign-in',
  signOut: '/api/auth/sign-out',
  passwordResetRequests: '/api/auth/password-reset-requests',
  passwordReset: '/api/auth/password-reset',
  acceptInvitation: '/api/auth/invitations/accept',
  authConfig: '/api/auth/config',
  /** School sign-on: a full-page navigation to the server, which redirects to the provider. */
  signOn: (next?: string) => withQuery('/api/auth/sign-on', { next }),
  staff: '/api/admin/users',
  staffInvitations: '/api/admin/users/invitations',
  staffDeactivate: (userId: string) => `/api/admin/users/${id(userId)}/deactivate`,
  staffReactivate: (userId: string) => `/api/admin/users/${id(userId)}/reactivate`,
  adminSchool: '/api/admin/school',

  banks: (query: BankListQuery = {}) => withQuery('/api/banks', { ...query }),
  bankCreate: '/api/banks',
  bankImport: '/api/banks/import',
  bank: (bankId: string) => `/api/banks/${id(bankId)}`,
  bankExport: (bankId: string) => `/api/banks/${id(bankId)}/export`,
  bankDuplicate: (bankId: string) => `/api/banks/${id(bankId)}/duplicate`,
  bankArchive: (bankId: string) => `/api/banks/${id(bankId)}/archive`,
  bankUnarchive: (bankId: string) => `/api/banks/${id(bankId)}/unarchive`,
  bankShares: (bankId: string) => `/api/banks/${id(bankId)}/shares`,
  bankShare: (bankId: string, userId: string) => `/api/banks/${id(bankId)}/shares/${id(userId)}`,
  bankItems: (bankId: string) => `/api/banks/${id(bankId)}/items`,
  bankItemsImport: (bankId: string) => `/api/banks/${id(bankId)}/items/import`,
  bankItemsOrder: (bankId: string) => `/api/banks/${id(bankId)}/items/order`,
  bankItem: (bankId: string, itemId: string) => `/api/banks/${id(bankId)}/items/${id(itemId)}`,

  mediaImages: '/api/media/images',
  mediaImage: (mediaId: string) => `/api/media/images/${id(mediaId)}`,

  classes: (archived: 'true' | 'false' | 'all' = 'false') => withQuery('/api/classes', { archived }),
  classCreate: '/api/classes',
  class: (classId: string) => `/api/classes/${id(classId)}`,
  classArchive: (classId: string) => `/api/classes/${id(classId)}/archive`,
  classUnarchive: (classId: string) => `/api/classes/${id(classId)}/unarchive`,
  classCoTeachers: (classId: string) => `/api/classes/${id(classId)}/co-teachers`,
  classCoTeacher: (classId: string, userId: string) => `/api/classes/${id(classId)}/co-teachers/${id(userId)}`,
  classRoster: (classId: string) => `/api/classes/${id(classId)}/roster`,
  classRosterImport: (classId: string) => `/api/classes/${id(classId)}/roster/import`,
  classRosterEntry: (classId: string, entryId: string) => `/api/classes/${id(classId)}/roster/${id(entryId)}`,
  classPairs: (classId: string) => `/api/classes/${id(classId)}/pairs`,
  classPair: (classId: string, pairId: string) => `/api/classes/${id(classId)}/pairs/${id(pairId)}`,

  sessions: '/api/sessions',
  session: (sessionId: string) => `/api/sessions/${id(sessionId)}`,

  debriefs: '/api/debriefs',
  debrief: (sessionId: string) => `/api/sessions/${id(sessionId)}/debrief`,
  debriefItem: (sessionId: string, itemId: string) => `/api/sessions/${id(sessionId)}/debrief/items/${id(itemId)}`,
  debriefEmail: (sessionId: string) => `/api/sessions/${id(sessionId)}/debrief/email`,
  sessionCatchups: (sessionId: string) => `/api/sessions/${id(sessionId)}/catchups`,
  catchupResults: (sessionId: string, catchupId: string) => `/api/sessions/${id(sessionId)}/catchups/${id(catchupId)}/results`,
  catchupClose: (sessionId: string, catchupId: string) => `/api/sessions/${id(sessionId)}/catchups/${id(catchupId)}/close`,
  gradebookCsv: (sessionId: string) => `/api/sessions/${id(sessionId)}/exports/gradebook.csv`,
  itemAnalysisCsv: (sessionId: string) => `/api/sessions/${id(sessionId)}/exports/item-analysis.csv`,
  classTrends: (classId: string) => `/api/classes/${id(classId)}/trends`,
  studentHistory: (classId: string, entryId: string) => `/api/classes/${id(classId)}/roster/${id(entryId)}/history`,
  /** DELETE: one student's data across the class's ended sessions (the class's owner). */
  rosterEntryData: (classId: string, entryId: string) => `/api/classes/${id(classId)}/roster/${id(entryId)}/data`,
  /** DELETE: one player's data in one ended session. */
  sessionPlayerData: (sessionId: string, playerId: string) => `/api/sessions/${id(sessionId)}/players/${id(playerId)}/data`,
} as const;
