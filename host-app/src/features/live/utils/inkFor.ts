/**
 * Black or white, whichever stands out more on the given #RRGGBB fill (WCAG 2.x relative
 * luminance; the 0.179 crossover is where both contrasts are equal).
 */
export function inkFor(hex: string): '#000000' | '#FFFFFF' {
  const channel = (i: number) => {
    const c = parseInt(hex.slice(1 + i * 2, 3 + i * 2), 16) / 255;
    return c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
  };
  const luminance = 0.2126 * channel(0) + 0.7152 * channel(1) + 0.0722 * channel(2);
  return luminance > 0.179 ? '#000000' : '#FFFFFF';
}
