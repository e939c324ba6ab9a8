import type { TeamView } from '@covalent/shared-types';
import { TeamSwatch } from './TeamSwatch';

export interface TeamNameProps {
  team: Pick<TeamView, 'name' | 'colour' | 'pattern'>;
  swatchSize?: number;
}

/** A team's swatch and name side by side: the way a team is shown everywhere on the host screen. */
export function TeamName({ team, swatchSize }: TeamNameProps) {
  return (
    <span style={{ display: 'inline-flex', alignItems: 'center', gap: 12 }}>
      <TeamSwatch colour={team.colour} pattern={team.pattern} size={swatchSize} />
      <span>{team.name}</span>
    </span>
  );
}
