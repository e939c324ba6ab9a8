import type { ApiError } from '@covalent/shared-types';

export interface ImportProblem {
  /** "Row 3, column correct", or the field as the server named it. */
  where: string;
  message: string;
}

const capitalise = (s: string): string => (s ? s[0].toUpperCase() + s.slice(1) : s);

/** The server's per-cell report (`row 3, column correct`) as lines a teacher can work down, in file order. */
export function importProblems(error: ApiError | undefined): ImportProblem[] {
  return (error?.details ?? []).map((d) => ({ where: capitalise(d.field), message: d.message }));
}
