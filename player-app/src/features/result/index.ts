export { EndSummary } from './components/EndSummary';
export { ResultScreen } from './components/ResultScreen';
export type { ResultScreenProps } from './components/ResultScreen';
export { StandingCard } from './components/StandingCard';
export type { StandingCardProps } from './components/StandingCard';
export { describeKey, formatPoints, ordinal } from './utils/describeKey';
