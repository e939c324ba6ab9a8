import type { FigureDto } from '@covalent/shared-types';
import { figureReason, formatCoefficient, formatFigure } from '../utils/formatFigure';

export interface FigureTextProps {
  figure: FigureDto;
  format?: (value: number) => string;
}

/** A figure, or "not enough data" with the server's reason on hover. */
export function FigureText({ figure, format = formatCoefficient }: FigureTextProps) {
  const reason = figureReason(figure);
  return reason ? (
    <span title={reason} style={{ color: 'var(--gray-11)' }}>
      {formatFigure(figure, format)}
    </span>
  ) : (
    <>{formatFigure(figure, format)}</>
  );
}
