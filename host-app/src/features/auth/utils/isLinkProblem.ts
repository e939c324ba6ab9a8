/** Server codes that mean the e-mailed link itself is no good, so a new one is needed. */
const LINK_PROBLEMS: ReadonlySet<string> = new Set(['link_invalid', 'link_used', 'link_expired']);

export function isLinkProblem(code: string | undefined): boolean {
  return code !== undefined && LINK_PROBLEMS.has(code);
}
