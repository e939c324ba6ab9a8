export { EndSummary } from './components/EndSummary';
export { ResultScreen } from './components/ResultScreen';
export { RightAnswer } from './components/RightAnswer';
export type { RightAnswerProps } from './components/RightAnswer';
export type { ResultScreenProps } from './components/ResultScreen';
export { StandingCard } from './components/StandingCard';
export type { StandingCardProps } from './components/StandingCard';
export { describeKey, formatPoints, ordinal } from './utils/describeKey';
