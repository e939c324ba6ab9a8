import type { Format, TeamView } from '@covalent/shared-types';
import { PlayerRow } from './PlayerRow';
import { TeamName } from './TeamName';

export interface TeamCardProps {
  team: TeamView;
  format: Format;
}

/** A team in the lobby: swatch, name and members (numbered in the numbered format). */
export function TeamCard({ team, format }: TeamCardProps) {
  const members = team.members.filter((m) => m.status !== 'removed');
  return (
    <section className="host-team" aria-label={`Team ${team.name}`}>
      <h3 className="host-team-name">
        <TeamName team={team} />
      </h3>
      {members.length === 0 ? (
        <p className="host-mixer">No one yet</p>
      ) : (
        <ul className="host-members">
          {members.map((m) => (
            <PlayerRow
              key={m.playerId}
              playerId={m.playerId}
              nickname={m.nickname}
              status={m.status}
              number={format === 'numbered' ? m.number : undefined}
            />
          ))}
        </ul>
      )}
    </section>
  );
}
