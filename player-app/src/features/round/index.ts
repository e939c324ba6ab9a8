export { AnswerScreen } from './components/AnswerScreen';
export type { AnswerScreenProps } from './components/AnswerScreen';
export { ChoiceAnswer } from './components/ChoiceAnswer';
export type { ChoiceAnswerProps } from './components/ChoiceAnswer';
export { Countdown } from './components/Countdown';
export type { CountdownProps } from './components/Countdown';
export { OrderAnswer } from './components/OrderAnswer';
export type { OrderAnswerProps } from './components/OrderAnswer';
export { RoundWaiting } from './components/RoundWaiting';
export type { RoundWaitingProps } from './components/RoundWaiting';
export { TypedAnswer } from './components/TypedAnswer';
export type { TypedAnswerProps } from './components/TypedAnswer';
export { VoteNames } from './components/VoteNames';
export type { VoteNamesProps } from './components/VoteNames';
export { useAnswerSender } from './hooks/useAnswerSender';
export type { AnswerSender } from './hooks/useAnswerSender';
export { useCountdown } from './hooks/useCountdown';
export type { Countdown as CountdownState } from './hooks/useCountdown';
export {
  choiceOptions,
  choiceResponse,
  describeResponse,
  pickedOptionIds,
  sameResponse,
} from './utils/describeResponse';
export { emptyDraft, isCompleteDraft } from './utils/answerDraft';
