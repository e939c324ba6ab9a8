/** A figure of the history pages: a value, or null with the reason (the debrief's FigureDto shape). */
export type HistoryFigure = { value: number; reason: null } | { value: null; reason: string };

export const NO_PERCENT_REASON = 'no session with a computed percent';

/** The mean of the figures that were computed; figures that were not are left out, not counted as 0. */
export function meanOfFigures(figures: readonly HistoryFigure[]): HistoryFigure {
  const values = figures.flatMap((f) => (f.value === null ? [] : [f.value]));
  if (values.length === 0) return { value: null, reason: NO_PERCENT_REASON };
  return { value: values.reduce((sum, v) => sum + v, 0) / values.length, reason: null };
}
