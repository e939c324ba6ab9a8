import type { HostSessionView } from '@covalent/shared-types';
import { Countdown } from './Countdown';
import { HostControls } from './HostControls';
import { ItemDisplay } from './ItemDisplay';
import { TeamProgress } from './TeamProgress';

export interface RoundViewProps {
  view: HostSessionView;
  round: NonNullable<HostSessionView['round']>;
}

/** A round being played (ready, open or closed): the item, the clock and each team's progress. */
export function RoundView({ view, round }: RoundViewProps) {
  return (
    <div className="host-main">
      <p className="host-round-meta">
        Item {round.itemIndex + 1} of {round.itemCount}
      </p>
      <div className="host-round">
        <ItemDisplay item={round.item} />
        <aside className="host-panel host-main" aria-label="Round status">
          <Countdown timing={round.timing} />
          <TeamProgress
            teams={view.teams}
            progress={round.progress}
            format={view.session.format}
            ready={round.timing.status === 'ready'}
          />
        </aside>
      </div>
      <HostControls view={view} />
    </div>
  );
}
