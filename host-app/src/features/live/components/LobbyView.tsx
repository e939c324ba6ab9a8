import type { HostSessionView } from '@covalent/shared-types';
import { Button } from '@radix-ui/themes';
import { sendHostCommand } from '@/realtime';
import { HostControls } from './HostControls';
import { JoinCodePanel } from './JoinCodePanel';
import { PlayerRow } from './PlayerRow';
import { TeamCard } from './TeamCard';

export interface LobbyViewProps {
  view: HostSessionView;
  origin: string;
}

function playerCount(view: HostSessionView): number {
  const placed = view.teams.reduce((n, team) => n + team.members.filter((m) => m.status !== 'removed').length, 0);
  return placed + view.unplaced.length;
}

/** Before the first round: how to join, who has joined and on which team. */
export function LobbyView({ view, origin }: LobbyViewProps) {
  const count = playerCount(view);
  return (
    <div className="host-lobby">
      <JoinCodePanel joinCode={view.session.joinCode} joiningLocked={view.joiningLocked} origin={origin} />
      <div className="host-main">
        <h2 className="host-heading">
          {count === 1 ? '1 player' : `${count} players`} in {view.teams.length === 1 ? '1 team' : `${view.teams.length} teams`}
        </h2>
        {view.mixer && <p className="host-mixer">Mixer ({view.mixer.mode}): {view.mixer.description}</p>}
        <HostControls view={view}>
          <Button size="4" variant="soft" onClick={() => void sendHostCommand({ type: 'reshuffle' })}>
            Reshuffle
          </Button>
          <Button size="4" variant="soft" onClick={() => void sendHostCommand({ type: 'lock_joining', locked: !view.joiningLocked })}>
            {view.joiningLocked ? 'Unlock joining' : 'Lock joining'}
          </Button>
        </HostControls>
        <div className="host-teams">
          {view.teams.map((team) => (
            <TeamCard key={team.id} team={team} format={view.session.format} />
          ))}
        </div>
        {view.unplaced.length > 0 && (
          <section className="host-panel" aria-labelledby="unplaced-heading">
            <h3 id="unplaced-heading" className="host-team-name">
              Not on a team yet
            </h3>
            <ul className="host-members">
              {view.unplaced.map((p) => (
                <PlayerRow key={p.playerId} playerId={p.playerId} nickname={p.nickname} />
              ))}
            </ul>
          </section>
        )}
      </div>
    </div>
  );
}
