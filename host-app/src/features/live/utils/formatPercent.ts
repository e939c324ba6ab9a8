/** A 0–1 share as a whole percentage ("72%"), or an em dash when unknown. */
export function formatPercent(share: number | null): string {
  return share === null ? '—' : `${Math.round(share * 100)}%`;
}
