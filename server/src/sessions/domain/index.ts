export * from './types';
export { canonicalJson } from './canonical-json';
export { seededShuffle, drawCallCycle, resolveCall } from './call-order';
export { pluralityChoice } from './huddle-vote';
export { computeRoundResults } from './round-results';
export { teamStandings, classView, ownStanding } from './standings';
export { activeElapsed, deadlineOffset, pausedWithin, unitDeadlineAt, unitWindowMs } from './timing';
export { SessionEngine, resolveConfig, type CreateSessionInput, type FromSnapshotOptions } from './session-engine';
