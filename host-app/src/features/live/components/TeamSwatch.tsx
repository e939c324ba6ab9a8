import type { TeamPattern } from '@covalent/shared-types';
import { useId, type ReactNode } from 'react';
import { inkFor } from '../utils/inkFor';
import { teamColourName } from '../utils/teamColourName';

export interface TeamSwatchProps {
  colour: string;
  pattern: TeamPattern;
  /** Edge length in px. */
  size?: number;
}

/** One 12×12 tile of each pattern, drawn in the ink that contrasts with the colour. */
function tile(pattern: TeamPattern, ink: string): ReactNode {
  const line = { stroke: ink, strokeWidth: 2, fill: 'none' } as const;
  switch (pattern) {
    case 'dots':
      return <circle cx="6" cy="6" r="2.4" fill={ink} />;
    case 'stripes':
      return <rect x="0" y="4" width="12" height="4" fill={ink} />;
    case 'grid':
      return <path d="M0 0.5H12M0.5 0V12" {...line} />;
    case 'waves':
      return <path d="M0 6 Q3 2 6 6 T12 6" {...line} />;
    case 'diagonal':
      return <path d="M-1 13L13 -1" {...line} />;
    case 'checks':
      return <path d="M0 0H6V6H0ZM6 6H12V12H6Z" fill={ink} />;
    case 'crosses':
      return <path d="M6 2V10M2 6H10" {...line} />;
    case 'rings':
      return <circle cx="6" cy="6" r="3" {...line} />;
  }
}

/** A team's colour with its pattern over it, so teams never differ by colour alone. */
export function TeamSwatch({ colour, pattern, size = 40 }: TeamSwatchProps) {
  // useId's characters are not all valid in a url(#…) reference.
  const id = `team-pattern-${useId().replace(/[^a-zA-Z0-9_-]/g, '')}`;
  const ink = inkFor(colour);
  return (
    <svg width={size} height={size} viewBox="0 0 36 36" style={{ flexShrink: 0 }} role="img" aria-label={`${pattern} on ${teamColourName(colour)}`}>
      <defs>
        <pattern id={id} width="12" height="12" patternUnits="userSpaceOnUse">
          {tile(pattern, ink)}
        </pattern>
      </defs>
      <rect x="1" y="1" width="34" height="34" rx="6" fill={colour} stroke="#1f1f1f" strokeWidth="1.5" />
      <rect x="1" y="1" width="34" height="34" rx="6" fill={`url(#${id})`} />
    </svg>
  );
}
