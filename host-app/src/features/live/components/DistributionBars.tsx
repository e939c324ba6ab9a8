import type { AnswerDistribution, PlayerItemView } from '@covalent/shared-types';
import { distributionLabel } from '../utils/distributionLabel';

export interface DistributionBarsProps {
  distribution: AnswerDistribution;
  item: PlayerItemView;
}

/** How the class answered: one neutral bar per answer, the correct one marked with a word and a tick. */
export function DistributionBars({ distribution, item }: DistributionBarsProps) {
  const total = Math.max(distribution.total, 1);
  return (
    <ul className="host-bars" aria-label="How the class answered">
      {distribution.counts.map((row) => (
        <li key={row.optionId ?? row.label} className="host-bar-row" data-correct={row.correct}>
          <span className="host-bar-label">
            <span>{distributionLabel(row, item)}</span>
            {row.correct && (
              <span className="host-correct-mark">
                <svg width="22" height="22" viewBox="0 0 16 16" aria-hidden="true">
                  <path d="M3 8.5l3 3 7-7" fill="none" stroke="currentColor" strokeWidth="2.4" />
                </svg>
                Correct
              </span>
            )}
          </span>
          <span className="host-bar-count">{row.count}</span>
          <span className="host-bar-track" aria-hidden="true">
            <span className="host-bar-fill" style={{ display: 'block', width: `${(row.count / total) * 100}%` }} />
          </span>
        </li>
      ))}
    </ul>
  );
}
