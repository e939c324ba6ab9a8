/** Factories for the debrief service-layer specs (one place, per STYLE.md §15). Invented data. */
import type { ItemResponse } from '@covalent/shared-types';
import type { SessionItem } from '../sessions/entities/session.entity';
import type { DebriefSource, SourcePlayer, SourceResponse } from './debrief-source';
import { W10_STUDENTS } from './domain/debrief.fixtures';

export function singleItem(id: string, tags: string[] = []): SessionItem {
  return {
    id,
    type: 'single',
    prompt: `Prompt ${id}`,
    options: [
      { id: `${id}-a`, text: 'Beaker' },
      { id: `${id}-b`, text: 'Volumetric pipette' },
      { id: `${id}-c`, text: 'Conical flask' },
    ],
    key: { type: 'single', correctOptionId: `${id}-b` },
    explanation: 'Calibrated to one volume.',
    tags,
    imageId: null,
  };
}

export function player(id: string, overrides: Partial<SourcePlayer> = {}): SourcePlayer {
  return { id, nickname: `Nick ${id}`, rosterEntryId: null, rosterName: null, teamId: null, deleted: false, removedByHost: false, ...overrides };
}

export function emptySource(overrides: Partial<DebriefSource> = {}): DebriefSource {
  return {
    session: {
      id: 's1',
      bankId: 'b1',
      bankTitle: 'Lab entry & exit procedures',
      classId: null,
      className: null,
      format: 'solo',
      startedAt: new Date('2025-09-08T09:00:00Z'),
      createdAt: new Date('2025-09-08T08:55:00Z'),
      endedAt: new Date('2025-09-08T09:20:00Z'),
    },
    items: [],
    players: [],
    teams: [],
    responses: [],
    teamRounds: [],
    ...overrides,
  };
}

/** W10 (Wuensch, KR20.txt) as a played solo session: 1 = picked the key (b), 0 = picked a (a distractor). */
export function w10Source(): DebriefSource {
  const items = Array.from({ length: 10 }, (_, i) => singleItem(`Q${i + 1}`, [i < 5 ? 'glassware' : 'ppe']));
  const players = Object.keys(W10_STUDENTS).map((name) => player(name));
  const responses: SourceResponse[] = Object.entries(W10_STUDENTS).flatMap(([name, bits]) =>
    [...bits].map((bit, i) => {
      const response: ItemResponse = { type: 'single', optionId: `Q${i + 1}-${bit === '1' ? 'b' : 'a'}` };
      return { playerId: name, teamId: null, itemId: `Q${i + 1}`, response, credit: Number(bit) };
    }),
  );
  return emptySource({ items, players, responses });
}
