/**
 * Canonical JSON for vote comparison: object keys sorted, no whitespace, array
 * order kept. Two responses are "the same choice" when these strings are equal.
 * Follows the key-sorting idea of RFC 8785 (JCS) without its number formatting,
 * which JSON.stringify already gives for the integers and short decimals in responses.
 */
export function canonicalJson(value: unknown): string {
  const text = encode(value);
  return text === undefined ? 'null' : text;
}

function encode(value: unknown): string | undefined {
  if (value === null) return 'null';
  switch (typeof value) {
    case 'string':
    case 'boolean':
      return JSON.stringify(value);
    case 'number':
      return Number.isFinite(value) ? JSON.stringify(value) : 'null';
    case 'object':
      break;
    default:
      // undefined, functions, symbols, bigint: not JSON values, dropped like JSON.stringify does.
      return undefined;
  }
  if (Array.isArray(value)) {
    return `[${value.map((v) => encode(v) ?? 'null').join(',')}]`;
  }
  const record = value as Record<string, unknown>;
  const parts: string[] = [];
  for (const key of Object.keys(record).sort()) {
    const encoded = encode(record[key]);
    if (encoded !== undefined) parts.push(`${JSON.stringify(key)}:${encoded}`);
  }
  return `{${parts.join(',')}}`;
}
