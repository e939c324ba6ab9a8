import type { Format, HostSessionView, TeamView } from '@covalent/shared-types';
import { TeamName } from './TeamName';

export interface TeamProgressProps {
  teams: TeamView[];
  progress: NonNullable<HostSessionView['round']>['progress'];
  format: Format;
}

type ProgressRow = NonNullable<HostSessionView['round']>['progress'][number];

/** In numbered only the called member answers, so "1 of 3" would wrongly read as waiting on two more. */
function progressText(row: ProgressRow, format: Format): string {
  if (format === 'numbered') return row.answered > 0 ? 'Answered' : 'Not yet answered';
  return `${row.answered} of ${row.members} answered`;
}

/** How many on each team have answered; never who, and never whether they are right. */
export function TeamProgress({ teams, progress, format }: TeamProgressProps) {
  return (
    <ul className="host-progress" aria-label="Answers so far">
      {progress.map((row) => {
        const team = teams.find((t) => t.id === row.teamId);
        if (!team) return null;
        return (
          <li key={row.teamId} className="host-progress-row">
            <TeamName team={team} swatchSize={32} />
            <span />
            <span className="host-progress-count">{progressText(row, format)}</span>
          </li>
        );
      })}
    </ul>
  );
}
