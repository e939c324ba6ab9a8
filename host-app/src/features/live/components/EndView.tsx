import type { HostSessionView } from '@covalent/shared-types';
import { Link } from 'react-router-dom';
import { routes } from '@/routes';
import { formatPercent } from '../utils/formatPercent';
import { StandingsPanel } from './StandingsPanel';

export interface EndViewProps {
  view: HostSessionView;
}

/** The end of the session: how the class did and what to go over again. */
export function EndView({ view }: EndViewProps) {
  const summary = view.summary;
  return (
    <div className="host-round">
      <div className="host-main">
        <section className="host-panel host-main" aria-labelledby="accuracy-heading">
          <h2 id="accuracy-heading" className="host-heading">
            Class accuracy
          </h2>
          <p className="host-accuracy">{formatPercent(summary?.accuracy ?? null)}</p>
        </section>
        <section className="host-panel host-main" aria-labelledby="revisit-heading">
          <h2 id="revisit-heading" className="host-heading">
            Items to revisit
          </h2>
          {summary && summary.itemsToRevisit.length > 0 ? (
            <ol className="host-revisit">
              {summary.itemsToRevisit.map((item) => (
                <li key={item.itemId}>
                  {item.prompt} <span className="host-mixer">({formatPercent(item.p)} correct)</span>
                </li>
              ))}
            </ol>
          ) : (
            <p className="host-explanation">{summary ? 'None: every item went well.' : 'The summary is being prepared…'}</p>
          )}
        </section>
        <p className="host-caution">
          <Link to={routes.debrief.build(view.session.id)}>Open the debrief</Link> for item and student details.
        </p>
      </div>
      <StandingsPanel rows={view.standings} visibility={view.session.standings} teams={view.teams} />
    </div>
  );
}
