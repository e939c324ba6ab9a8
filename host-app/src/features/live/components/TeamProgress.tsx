import type { HostSessionView, TeamView } from '@covalent/shared-types';
import { TeamName } from './TeamName';

export interface TeamProgressProps {
  teams: TeamView[];
  progress: NonNullable<HostSessionView['round']>['progress'];
}

/** How many on each team have answered; never who, and never whether they are right. */
export function TeamProgress({ teams, progress }: TeamProgressProps) {
  return (
    <ul className="host-progress" aria-label="Answers so far">
      {progress.map((row) => {
        const team = teams.find((t) => t.id === row.teamId);
        if (!team) return null;
        return (
          <li key={row.teamId} className="host-progress-row">
            <TeamName team={team} swatchSize={32} />
            <span />
            <span className="host-progress-count">
              {row.answered} of {row.members} answered
            </span>
          </li>
        );
      })}
    </ul>
  );
}
