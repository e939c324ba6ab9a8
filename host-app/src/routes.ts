/** Adds a query string, leaving out empty values. */
function withQuery(path: string, query: Record<string, string | undefined>): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query)) {
    if (value !== undefined && value !== '') params.set(key, value);
  }
  const search = params.toString();
  return search ? `${path}?${search}` : path;
}

const segment = (value: string): string => encodeURIComponent(value);

/**
 * Every screen of the teacher app. `path` is the router pattern; `build` makes a link.
 * Nothing else in the app spells a URL by hand.
 */
export const routes = {
  signIn: {
    path: '/sign-in',
    /** `next` is where to go after signing in (an in-app path). */
    build: (next?: string) => withQuery('/sign-in', { next }),
  },
  forgotPassword: { path: '/forgot-password', build: () => '/forgot-password' },
  resetPassword: {
    path: '/reset-password',
    build: (token: string) => withQuery('/reset-password', { token }),
  },
  acceptInvite: {
    path: '/accept-invite',
    build: (token: string) => withQuery('/accept-invite', { token }),
  },
  dashboard: { path: '/', build: () => '/' },
  classes: { path: '/classes', build: () => '/classes' },
  classDetail: { path: '/classes/:classId', build: (classId: string) => `/classes/${segment(classId)}` },
  banks: { path: '/banks', build: () => '/banks' },
  bank: { path: '/banks/:bankId', build: (bankId: string) => `/banks/${segment(bankId)}` },
  sessions: { path: '/sessions', build: () => '/sessions' },
  session: { path: '/sessions/:sessionId', build: (sessionId: string) => `/sessions/${segment(sessionId)}` },
  /** Setting up a session; `bankId` preselects a bank. */
  sessionNew: {
    path: '/sessions/new',
    build: (preset: { bankId?: string; classId?: string } = {}) => withQuery('/sessions/new', preset),
  },
  /** The projected host screen, full-screen outside the app shell. */
  hostSession: { path: '/host/:sessionId', build: (sessionId: string) => `/host/${segment(sessionId)}` },
  debriefs: { path: '/debriefs', build: () => '/debriefs' },
  debrief: { path: '/debriefs/:sessionId', build: (sessionId: string) => `/debriefs/${segment(sessionId)}` },
  debriefItem: {
    path: '/debriefs/:sessionId/items/:itemId',
    build: (sessionId: string, itemId: string) => `/debriefs/${segment(sessionId)}/items/${segment(itemId)}`,
  },
  classTrends: { path: '/classes/:classId/trends', build: (classId: string) => `/classes/${segment(classId)}/trends` },
  studentHistory: {
    path: '/classes/:classId/students/:entryId',
    build: (classId: string, entryId: string) => `/classes/${segment(classId)}/students/${segment(entryId)}`,
  },
  adminStaff: { path: '/admin/staff', build: () => '/admin/staff' },
} as const;

export type RouteName = keyof typeof routes;
