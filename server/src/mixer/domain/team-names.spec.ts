import { createRng } from './rng';
import { DEFAULT_NAME_PACK, NAME_PACKS, teamNamePack, type NamePackId } from './team-names';

const PACKS = Object.keys(NAME_PACKS) as NamePackId[];

describe('teamNamePack', () => {
  it('defaults to the chemical elements, all 118 in order of atomic number', () => {
    expect(DEFAULT_NAME_PACK).toBe('elements');
    // IUPAC Periodic Table of the Elements (from memory): Z = 1, 2, 3, 26, 79, 118 and IUPAC spellings.
    const elements: readonly string[] = NAME_PACKS.elements;
    expect(elements).toHaveLength(118);
    expect([elements[0], elements[1], elements[2], elements[25], elements[78], elements[117]]).toEqual([
      'Hydrogen', 'Helium', 'Lithium', 'Iron', 'Gold', 'Oganesson',
    ]);
    expect(elements).toEqual(expect.arrayContaining(['Aluminium', 'Caesium', 'Sulfur']));
  });

  it.each(PACKS)('the %s pack holds enough distinct names for 75 teams', (pack) => {
    const names: readonly string[] = NAME_PACKS[pack];
    expect(new Set(names).size).toBe(names.length);
    expect(names.length).toBeGreaterThanOrEqual(75);
    expect(new Set(teamNamePack(pack, 75, createRng('names'))).size).toBe(75);
  });

  it('draws from the pack in a seeded order, the same for the same seed', () => {
    const first = teamNamePack('minerals', 8, createRng('lobby-1'));
    expect(teamNamePack('minerals', 8, createRng('lobby-1'))).toEqual(first);
    expect(teamNamePack('minerals', 8, createRng('lobby-2'))).not.toEqual(first);
    first.forEach((name) => expect(NAME_PACKS.minerals).toContain(name));
  });

  it('numbers repeats once the pack runs out, so names stay distinct', () => {
    const names = teamNamePack('constellations', NAME_PACKS.constellations.length + 2, createRng('many'));
    expect(new Set(names).size).toBe(names.length);
    expect(names.slice(-2)).toEqual([`${names[0]} 2`, `${names[1]} 2`]);
  });

  it('rejects a count that is not a non-negative integer', () => {
    expect(teamNamePack('elements', 0, createRng('x'))).toEqual([]);
    expect(() => teamNamePack('elements', -1, createRng('x'))).toThrow(RangeError);
    expect(() => teamNamePack('elements', 1.5, createRng('x'))).toThrow(RangeError);
  });
});
