import type { CSSProperties } from 'react';
import type { TeamView } from '@covalent/shared-types';
import { patternInk } from '../utils/patternInk';

export interface TeamSwatchProps {
  team: Pick<TeamView, 'colour' | 'pattern'>;
  size?: 'small' | 'large';
}

/** The team's colour with its pattern drawn over it; decorative, the name always goes beside it. */
export function TeamSwatch({ team, size = 'small' }: TeamSwatchProps) {
  const style = { '--team': team.colour, '--ink': patternInk(team.colour) } as CSSProperties;
  return <span className={`swatch swatch-${size} pattern-${team.pattern}`} style={style} aria-hidden="true" />;
}
