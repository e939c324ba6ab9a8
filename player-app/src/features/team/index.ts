export { TeamBadge } from './components/TeamBadge';
export type { TeamBadgeProps } from './components/TeamBadge';
export { TeamCard } from './components/TeamCard';
export type { TeamCardProps } from './components/TeamCard';
export { TeamSwatch } from './components/TeamSwatch';
export type { TeamSwatchProps } from './components/TeamSwatch';
export { patternInk, relativeLuminance } from './utils/patternInk';
