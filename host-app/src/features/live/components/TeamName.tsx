import type { TeamView } from '@covalent/shared-types';
import { TeamSwatch } from './TeamSwatch';

export interface TeamNameProps {
  team: Pick<TeamView, 'name' | 'colour' | 'pattern'>;
  swatchSize?: number;
}

/** A team's swatch and name side by side: the way a team is shown everywhere on the host screen. */
export function TeamName({ team, swatchSize }: TeamNameProps) {
  return (
    // minWidth 0: a name too long for its grid cell wraps there and the swatch keeps its size.
    <span style={{ display: 'inline-flex', alignItems: 'center', gap: 12, minWidth: 0 }}>
      <TeamSwatch colour={team.colour} pattern={team.pattern} size={swatchSize} />
      <span style={{ minWidth: 0, overflowWrap: 'break-word' }}>{team.name}</span>
    </span>
  );
}
