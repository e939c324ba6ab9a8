import type { TeamView, VoteView } from '@covalent/shared-types';

export interface VoteNamesProps {
  id?: string;
  votes: VoteView[];
  members: TeamView['members'];
  playerId: string;
}

/** Who on the team currently votes for something: "You, Ada (locked)". */
export function VoteNames({ id, votes, members, playerId }: VoteNamesProps) {
  if (votes.length === 0) return null;
  const names = votes.map((vote) => {
    const name =
      vote.playerId === playerId ? 'You' : (members.find((m) => m.playerId === vote.playerId)?.nickname ?? 'A teammate');
    return vote.locked ? `${name} (locked)` : name;
  });
  return (
    <span id={id} className="vote-names">
      {names.join(', ')}
    </span>
  );
}
