import type { ApiError } from '@covalent/shared-types';

type Detail = NonNullable<ApiError['details']>[number];

/** True when `field` is `path` itself or lies under it (`tags[2]` under `tags`, `key.tolerance.value` under `key.tolerance`). */
export function isUnder(field: string, path: string): boolean {
  return field === path || field.startsWith(`${path}.`) || field.startsWith(`${path}[`);
}

/**
 * Server details grouped by where a form shows them. `at(...paths)` takes the messages for those
 * paths and marks them placed; `unplaced()` returns the rest so nothing the server said is lost.
 */
export function fieldErrors(details: Detail[] | undefined) {
  // The validation pipe names array entries `options.1.text`; the item rules say `options[1].text`.
  const list = (details ?? []).map((d) => ({ ...d, field: d.field.replace(/\.(\d+)(?=\.|$)/g, '[$1]') }));
  const placed = new Set<number>();
  return {
    at(...paths: string[]): string[] {
      const out: string[] = [];
      list.forEach((d, i) => {
        if (paths.some((p) => isUnder(d.field, p))) {
          placed.add(i);
          out.push(d.message);
        }
      });
      return out;
    },
    /** Exactly this field, not its children. */
    exactly(path: string): string[] {
      const out: string[] = [];
      list.forEach((d, i) => {
        if (d.field === path) {
          placed.add(i);
          out.push(d.message);
        }
      });
      return out;
    },
    unplaced(): Detail[] {
      return list.filter((_, i) => !placed.has(i));
    },
  };
}
