import { describe, expect, it } from 'vitest';
import { TEAM_COLOURS } from '@covalent/shared-types';
import { patternInk, relativeLuminance } from './patternInk';

// WCAG 2.x "relative luminance" definition (from memory): white is 1, black is 0, and
// pure sRGB green is 0.7152, its coefficient.
describe('relativeLuminance', () => {
  it('matches the end points and the channel coefficients of the WCAG definition', () => {
    expect(relativeLuminance('#ffffff')).toBeCloseTo(1, 6);
    expect(relativeLuminance('#000000')).toBe(0);
    expect(relativeLuminance('#00ff00')).toBeCloseTo(0.7152, 6);
    expect(relativeLuminance('#0000ff')).toBeCloseTo(0.0722, 6);
  });

  it('linearises mid-grey: sRGB 128 is about 0.2158 (common practice check value)', () => {
    expect(relativeLuminance('#808080')).toBeCloseTo(0.2158, 3);
  });
});

describe('patternInk', () => {
  it('draws white on the dark team colours and dark ink on the light ones', () => {
    expect(patternInk('#000000')).toBe('#ffffff');
    expect(patternInk('#0072B2')).toBe('#ffffff');
    expect(patternInk('#F0E442')).toBe('#26221e');
    expect(patternInk('#E69F00')).toBe('#26221e');
  });

  it('gives every team colour an ink', () => {
    for (const colour of TEAM_COLOURS) expect(['#ffffff', '#26221e']).toContain(patternInk(colour));
  });
});
