/** Names of the Okabe–Ito colours (Okabe & Ito 2008, "Color Universal Design"; names from memory). */
const NAMES: Record<string, string> = {
  '#E69F00': 'orange',
  '#56B4E9': 'sky blue',
  '#009E73': 'bluish green',
  '#F0E442': 'yellow',
  '#0072B2': 'blue',
  '#D55E00': 'vermilion',
  '#CC79A7': 'reddish purple',
  '#000000': 'black',
};

/** A spoken name for a team colour, for screen readers; the hex value when unknown. */
export function teamColourName(hex: string): string {
  return NAMES[hex.toUpperCase()] ?? hex;
}
