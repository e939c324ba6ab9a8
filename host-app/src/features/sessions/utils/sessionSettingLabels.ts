import type { Format, MixerMode, NamePack, SessionStatus, StandingsView } from '@covalent/shared-types';

/** Our names for the session settings (DESIGN.md §3–4), with a line on what each does. */
export const sessionSettingLabels = {
  format: {
    huddle: { title: 'Team vote', description: 'Everyone votes on their own device and sees their team’s votes; the most-voted answer counts.' },
    numbered: { title: 'Numbered turns', description: 'The team talks it over; only the member whose number is called submits.' },
    solo: { title: 'Everyone answers', description: 'Each student answers alone; a team scores the mean of its members.' },
  } satisfies Record<Format, { title: string; description: string }>,
  mixer: {
    random: { title: 'Random', description: 'Even team sizes, members drawn at random.' },
    'mix-tables': { title: 'Mix tables', description: 'Spreads each table group across teams, so students work beyond their table.' },
    balanced: { title: 'Balanced', description: 'Mixes tables and also evens out how teams did in earlier sessions.' },
  } satisfies Record<MixerMode, { title: string; description: string }>,
  standings: {
    full: 'Full standings',
    top3: 'Top 3 only',
    none: 'None (each team sees only its own)',
  } satisfies Record<StandingsView, string>,
  namePack: {
    elements: 'Chemical elements',
    minerals: 'Minerals',
    constellations: 'Constellations',
  } satisfies Record<NamePack, string>,
  status: {
    lobby: 'In lobby',
    running: 'Running',
    paused: 'Paused',
    ended: 'Ended',
  } satisfies Record<SessionStatus, string>,
} as const;
