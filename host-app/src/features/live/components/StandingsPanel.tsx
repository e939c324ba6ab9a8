import type { StandingRow, StandingsView, TeamView } from '@covalent/shared-types';
import { visibleStandings } from '../utils/visibleStandings';
import { TeamName } from './TeamName';

export interface StandingsPanelProps {
  rows: StandingRow[];
  visibility: StandingsView;
  teams: TeamView[];
}

/** Team standings as the teacher chose to show them: full, top 3, or not at all. */
export function StandingsPanel({ rows, visibility, teams }: StandingsPanelProps) {
  const shown = visibleStandings(rows, visibility);
  if (visibility === 'none') return null;
  return (
    <section className="host-panel host-main" aria-labelledby="standings-heading">
      <h2 id="standings-heading" className="host-heading">
        {visibility === 'top3' ? 'Top 3' : 'Standings'}
      </h2>
      <ol className="host-standings">
        {shown.map((row) => {
          const team = teams.find((t) => t.id === row.teamId);
          return (
            <li key={row.teamId} className="host-standing">
              <span className="host-standing-rank">{row.rank}</span>
              {team ? <TeamName team={team} swatchSize={32} /> : <span>{row.name}</span>}
              <span className="host-standing-points">{row.points.toLocaleString('en')} pts</span>
            </li>
          );
        })}
      </ol>
    </section>
  );
}
