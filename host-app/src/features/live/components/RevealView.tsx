import type { HostSessionView } from '@covalent/shared-types';
import { describeKey } from '../utils/describeKey';
import { DistributionBars } from './DistributionBars';
import { HostControls } from './HostControls';
import { StandingsPanel } from './StandingsPanel';

export interface RevealViewProps {
  view: HostSessionView;
  round: NonNullable<HostSessionView['round']>;
  reveal: NonNullable<NonNullable<HostSessionView['round']>['reveal']>;
}

/** After a round: how the class answered, the answer and why, and the standings. */
export function RevealView({ view, round, reveal }: RevealViewProps) {
  return (
    <div className="host-main">
      <p className="host-round-meta">
        Item {round.itemIndex + 1} of {round.itemCount}
      </p>
      <h2 className="host-prompt">{round.item.prompt}</h2>
      <div className="host-round">
        <div className="host-main">
          <DistributionBars distribution={reveal.distribution} item={round.item} />
          <section className="host-panel host-main" aria-labelledby="why-heading">
            <h3 id="why-heading" className="host-heading">
              Answer: {describeKey(reveal.key, round.item)}
            </h3>
            {reveal.explanation && <p className="host-explanation">{reveal.explanation}</p>}
          </section>
        </div>
        <StandingsPanel rows={view.standings} visibility={view.session.standings} teams={view.teams} />
      </div>
      <HostControls view={view} />
    </div>
  );
}
