import type { CreateSessionRequest, Format, MixerMode, NamePack, StandingsView } from '@covalent/shared-types';

/** The setup form as typed (numbers as the text in their inputs). */
export interface SessionSetupValues {
  bankId: string;
  /** The bank's items in the teacher's order, or null to play all of them in bank order. */
  itemOrder: string[] | null;
  /** Items left out of `itemOrder`. */
  excludedItemIds: string[];
  /** '' for an ad-hoc group. */
  classId: string;
  format: Format;
  roundSeconds: string;
  speedWeight: number;
  standings: StandingsView;
  teamSizing: 'count' | 'size';
  teamNumber: string;
  mixerMode: MixerMode;
  namePack: NamePack;
}

export type SessionSetupField = 'bankId' | 'items' | 'roundSeconds' | 'speedWeight' | 'teamNumber';

export type BuildResult =
  | { ok: true; request: CreateSessionRequest }
  | { ok: false; errors: Partial<Record<SessionSetupField, string>> };

export const DEFAULT_SETUP: Omit<SessionSetupValues, 'bankId'> = {
  itemOrder: null,
  excludedItemIds: [],
  classId: '',
  format: 'huddle',
  roundSeconds: '30',
  speedWeight: 0.5,
  standings: 'full',
  teamSizing: 'size',
  teamNumber: '4',
  mixerMode: 'mix-tables',
  namePack: 'elements',
};

const ROUND_SECONDS = { min: 5, max: 300 } as const;
const TEAM_COUNT = { min: 2, max: 40 } as const;
const TEAM_SIZE = { min: 2, max: 8 } as const;

function wholeNumberIn(text: string, min: number, max: number): number | null {
  if (!/^\d+$/.test(text.trim())) return null;
  const value = Number(text.trim());
  return value >= min && value <= max ? value : null;
}

/** Checks the form and turns it into the `POST /api/sessions` body. */
export function buildCreateSessionRequest(values: SessionSetupValues): BuildResult {
  const errors: Partial<Record<SessionSetupField, string>> = {};
  if (!values.bankId) errors.bankId = 'Choose a bank.';

  let itemIds: string[] | undefined;
  if (values.itemOrder) {
    const excluded = new Set(values.excludedItemIds);
    itemIds = values.itemOrder.filter((id) => !excluded.has(id));
    if (itemIds.length === 0) errors.items = 'Choose at least one item.';
  }

  const roundSeconds = wholeNumberIn(values.roundSeconds, ROUND_SECONDS.min, ROUND_SECONDS.max);
  if (roundSeconds === null) errors.roundSeconds = `Enter whole seconds from ${ROUND_SECONDS.min} to ${ROUND_SECONDS.max}.`;

  if (!(values.speedWeight >= 0 && values.speedWeight <= 1)) errors.speedWeight = 'Speed weight runs from 0 to 1.';

  const range = values.teamSizing === 'count' ? TEAM_COUNT : TEAM_SIZE;
  const teamNumber = wholeNumberIn(values.teamNumber, range.min, range.max);
  if (teamNumber === null) {
    errors.teamNumber =
      values.teamSizing === 'count'
        ? `Enter a number of teams from ${range.min} to ${range.max}.`
        : `Enter a team size from ${range.min} to ${range.max}.`;
  }

  if (Object.keys(errors).length > 0 || roundSeconds === null || teamNumber === null) return { ok: false, errors };

  return {
    ok: true,
    request: {
      bankId: values.bankId,
      ...(itemIds ? { itemIds } : {}),
      classId: values.classId || null,
      format: values.format,
      roundSeconds,
      speedWeight: values.speedWeight,
      standings: values.standings,
      ...(values.teamSizing === 'count' ? { teamCount: teamNumber } : { targetTeamSize: teamNumber }),
      mixerMode: values.mixerMode,
      namePack: values.namePack,
    },
  };
}
