import type { OwnStanding } from '@/stores/useGameStore';
import { formatPoints, ordinal } from '../utils/describeKey';

export interface StandingCardProps {
  standing: NonNullable<OwnStanding>;
  teamName: string | null;
  /** At the end of the session the points are final, not "so far". */
  final?: boolean;
}

/** Your own team's place: players always see it, whatever the class is shown. */
export function StandingCard({ standing, teamName, final = false }: StandingCardProps) {
  return (
    <section className="standing-card" aria-label="Your team's standing">
      <p className="standing-rank">
        {teamName ? `Team ${teamName}` : 'Your team'} is <strong>{ordinal(standing.rank)}</strong> of{' '}
        {standing.teamCount}
      </p>
      <p className="standing-points">
        {formatPoints(standing.points)} points{final ? '' : ' so far'}
      </p>
    </section>
  );
}
