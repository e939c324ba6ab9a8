import type { ClassTrendDto } from '@covalent/shared-types';
import { formatDate } from './formatDate';

/** A tag in one session: its accuracy in percent, or null when not played there or not computable. */
export interface TrendCell {
  played: boolean;
  percent: number | null;
}

export interface TrendRow {
  sessionId: string;
  label: string;
  bankTitle: string;
  endedAt: string;
  cells: Record<string, TrendCell>;
}

/** Sessions oldest first, each with every tag's accuracy (one decimal of a percent). */
export function trendRows(trend: ClassTrendDto): TrendRow[] {
  return trend.sessions.map((s) => {
    const cells: Record<string, TrendCell> = {};
    for (const { tag, points } of trend.tags) {
      const point = points.find((p) => p.sessionId === s.sessionId);
      const share = point?.accuracy.value ?? null;
      cells[tag] = { played: point !== undefined, percent: share === null ? null : Math.round(share * 1000) / 10 };
    }
    return { sessionId: s.sessionId, label: formatDate(s.endedAt), bankTitle: s.bankTitle, endedAt: s.endedAt, cells };
  });
}

/** Rows shaped for the chart: `{ label, [tag]: percent | null }`. */
export function chartData(rows: readonly TrendRow[]): Record<string, string | number | null>[] {
  return rows.map((r) => {
    const point: Record<string, string | number | null> = { label: r.label };
    for (const [tag, cell] of Object.entries(r.cells)) point[tag] = cell.percent;
    return point;
  });
}
