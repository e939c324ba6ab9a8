/** A copy of `list` with the entry at `from` moved to `to` (both clamped into range). */
export function moveInList<T>(list: readonly T[], from: number, to: number): T[] {
  const copy = [...list];
  if (from < 0 || from >= copy.length) return copy;
  const target = Math.max(0, Math.min(copy.length - 1, to));
  const [entry] = copy.splice(from, 1);
  copy.splice(target, 0, entry);
  return copy;
}
