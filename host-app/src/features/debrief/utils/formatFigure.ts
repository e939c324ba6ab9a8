import { NOT_ENOUGH_DATA, type FigureDto } from '@covalent/shared-types';

/** A 0..1 share as a percentage with one decimal ("72.5%"). */
export function formatShare(share: number): string {
  return `${(share * 100).toFixed(1)}%`;
}

/** A coefficient to two decimals, with a real minus sign for negatives (read aloud correctly). */
export function formatCoefficient(value: number): string {
  const text = Math.abs(value).toFixed(2);
  return value < 0 ? `−${text}` : text;
}

/** A figure as text, or "not enough data" when the server could not compute it. */
export function formatFigure(figure: FigureDto, format: (value: number) => string = formatCoefficient): string {
  return figure.value === null ? NOT_ENOUGH_DATA : format(figure.value);
}

/** The figure's reason for a tooltip, when there is one. */
export function figureReason(figure: FigureDto): string | undefined {
  return figure.value === null ? figure.reason : undefined;
}
