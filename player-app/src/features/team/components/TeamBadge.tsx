import type { TeamView } from '@covalent/shared-types';
import { TeamSwatch } from './TeamSwatch';

export interface TeamBadgeProps {
  team: TeamView;
  /** Your number, shown in the numbered format. */
  number: number | null;
}

/** The compact team reminder in the header during rounds. */
export function TeamBadge({ team, number }: TeamBadgeProps) {
  return (
    <p className="team-badge">
      <TeamSwatch team={team} />
      <span>
        Team {team.name}
        {number !== null && <> · you are number {number}</>}
      </span>
    </p>
  );
}
