export type {
  CostBreakdown, MixerBudget, MixerInput, MixerMode, MixerPlayer, MixerResult, PairingHistory,
} from './mixer.types';
export { createRng, shuffle, type Rng } from './rng';
export { DEFAULT_MIXER_BUDGET, formTeams, scoreTeams } from './form-teams';
export { DEFAULT_TARGET_SIZE, MIXER_WEIGHTS } from './mixer-model';
export { describeCost } from './describe-cost';
export { placeLateJoiner } from './place-late-joiner';
export { DEFAULT_NAME_PACK, NAME_PACKS, teamNamePack, type NamePackId } from './team-names';
