/**
 * Relative luminance of an sRGB colour, as WCAG 2.x defines it (linearise each channel:
 * c ≤ 0.04045 ? c/12.92 : ((c+0.055)/1.055)^2.4; L = 0.2126 R + 0.7152 G + 0.0722 B; from memory).
 */
export function relativeLuminance(hex: string): number {
  const match = /^#?([0-9a-f]{6})$/i.exec(hex.trim());
  if (!match?.[1]) return 0;
  const value = Number.parseInt(match[1], 16);
  const channel = (shift: number) => {
    const c = ((value >> shift) & 0xff) / 255;
    return c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
  };
  return 0.2126 * channel(16) + 0.7152 * channel(8) + 0.0722 * channel(0);
}

/** The ink that draws a team's pattern over its colour: white on dark colours, near-black on light. */
export function patternInk(hex: string): string {
  // 0.179 is where white and black give equal contrast: (1.05)/(L+0.05) = (L+0.05)/(0.05).
  return relativeLuminance(hex) > 0.179 ? '#26221e' : '#ffffff';
}
