import type { Format, HostSessionView, TeamView } from '@covalent/shared-types';
import { TeamName } from './TeamName';

export interface TeamProgressProps {
  teams: TeamView[];
  progress: NonNullable<HostSessionView['round']>['progress'];
  format: Format;
  /** Before the round opens nobody can have answered, so each team's size is shown instead. */
  ready?: boolean;
}

type ProgressRow = NonNullable<HostSessionView['round']>['progress'][number];

/** In numbered only the called member answers, so "1 of 3" would wrongly read as waiting on two more. */
function progressText(row: ProgressRow, format: Format): string {
  if (format === 'numbered') return row.answered > 0 ? 'Answered' : 'Not yet answered';
  return `${row.answered} of ${row.members} answered`;
}

const playersText = (team: TeamView): string => {
  const playing = team.members.filter((m) => m.status !== 'removed').length;
  return `${playing} ${playing === 1 ? 'player' : 'players'}`;
};

/** How many on each team have answered; never who, and never whether they are right. */
export function TeamProgress({ teams, progress, format, ready = false }: TeamProgressProps) {
  return (
    <ul className="host-progress" aria-label={ready ? 'Teams' : 'Answers so far'}>
      {progress.map((row) => {
        const team = teams.find((t) => t.id === row.teamId);
        if (!team) return null;
        return (
          <li key={row.teamId} className="host-progress-row">
            <TeamName team={team} swatchSize={32} />
            <span className="host-progress-count">{ready ? playersText(team) : progressText(row, format)}</span>
          </li>
        );
      })}
    </ul>
  );
}
