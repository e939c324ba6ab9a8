import type { Format, TeamView } from '@covalent/shared-types';
import { TeamSwatch } from './TeamSwatch';

export interface TeamCardProps {
  team: TeamView;
  playerId: string;
  format: Format;
}

export function TeamCard({ team, playerId, format }: TeamCardProps) {
  const numbered = format === 'numbered';
  const me = team.members.find((m) => m.playerId === playerId);
  return (
    <section className="team-card" aria-labelledby="team-card-title">
      <h2 id="team-card-title" className="team-card-title">
        <TeamSwatch team={team} size="large" />
        <span>
          <span className="team-card-label">Your team</span>
          {team.name}
        </span>
      </h2>
      <p className="team-card-pattern">Pattern: {team.pattern}</p>
      {numbered && me && (
        <p className="team-card-number">
          You are number <strong>{me.number}</strong>
        </p>
      )}
      <h3 className="team-card-subtitle">Teammates</h3>
      <ul className="member-list">
        {team.members.map((member) => (
          <li key={member.playerId}>
            {numbered && <span className="member-number">{member.number}</span>}
            <span className="member-name">{member.nickname}</span>
            {member.playerId === playerId && <span className="member-note"> (you)</span>}
            {member.status === 'away' && <span className="member-note"> — away</span>}
          </li>
        ))}
      </ul>
    </section>
  );
}
