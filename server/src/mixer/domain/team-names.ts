import { shuffle, type Rng } from './rng';

/** The 118 elements in order of atomic number, IUPAC spellings (aluminium, caesium, sulfur). */
const ELEMENTS = [
  'Hydrogen', 'Helium', 'Lithium', 'Beryllium', 'Boron', 'Carbon', 'Nitrogen', 'Oxygen', 'Fluorine',
  'Neon', 'Sodium', 'Magnesium', 'Aluminium', 'Silicon', 'Phosphorus', 'Sulfur', 'Chlorine',
  'Argon', 'Potassium', 'Calcium', 'Scandium', 'Titanium', 'Vanadium', 'Chromium', 'Manganese',
  'Iron', 'Cobalt', 'Nickel', 'Copper', 'Zinc', 'Gallium', 'Germanium', 'Arsenic', 'Selenium',
  'Bromine', 'Krypton', 'Rubidium', 'Strontium', 'Yttrium', 'Zirconium', 'Niobium', 'Molybdenum',
  'Technetium', 'Ruthenium', 'Rhodium', 'Palladium', 'Silver', 'Cadmium', 'Indium', 'Tin',
  'Antimony', 'Tellurium', 'Iodine', 'Xenon', 'Caesium', 'Barium', 'Lanthanum', 'Cerium',
  'Praseodymium', 'Neodymium', 'Promethium', 'Samarium', 'Europium', 'Gadolinium', 'Terbium',
  'Dysprosium', 'Holmium', 'Erbium', 'Thulium', 'Ytterbium', 'Lutetium', 'Hafnium', 'Tantalum',
  'Tungsten', 'Rhenium', 'Osmium', 'Iridium', 'Platinum', 'Gold', 'Mercury', 'Thallium', 'Lead',
  'Bismuth', 'Polonium', 'Astatine', 'Radon', 'Francium', 'Radium', 'Actinium', 'Thorium',
  'Protactinium', 'Uranium', 'Neptunium', 'Plutonium', 'Americium', 'Curium', 'Berkelium',
  'Californium', 'Einsteinium', 'Fermium', 'Mendelevium', 'Nobelium', 'Lawrencium', 'Rutherfordium',
  'Dubnium', 'Seaborgium', 'Bohrium', 'Hassium', 'Meitnerium', 'Darmstadtium', 'Roentgenium',
  'Copernicium', 'Nihonium', 'Flerovium', 'Moscovium', 'Livermorium', 'Tennessine', 'Oganesson',
] as const;

/** Common rock-forming, ore and gem minerals. */
const MINERALS = [
  'Agate', 'Albite', 'Amethyst', 'Anatase', 'Andalusite', 'Anhydrite', 'Apatite', 'Aragonite',
  'Augite', 'Azurite', 'Barite', 'Benitoite', 'Beryl', 'Biotite', 'Bornite', 'Brucite', 'Calcite',
  'Cassiterite', 'Celestine', 'Cerussite', 'Chalcedony', 'Chalcopyrite', 'Chromite', 'Chrysoberyl',
  'Cinnabar', 'Citrine', 'Corundum', 'Covellite', 'Cryolite', 'Cuprite', 'Diamond', 'Diopside',
  'Dolomite', 'Epidote', 'Feldspar', 'Fluorite', 'Galena', 'Garnet', 'Goethite', 'Graphite',
  'Gypsum', 'Halite', 'Hematite', 'Hornblende', 'Ilmenite', 'Jadeite', 'Kaolinite', 'Kyanite',
  'Labradorite', 'Lazurite', 'Lepidolite', 'Magnetite', 'Malachite', 'Marcasite', 'Mica',
  'Microcline', 'Molybdenite', 'Muscovite', 'Nepheline', 'Olivine', 'Opal', 'Orthoclase', 'Pyrite',
  'Pyrolusite', 'Quartz', 'Rhodochrosite', 'Rhodonite', 'Rutile', 'Sphalerite', 'Spinel',
  'Staurolite', 'Talc', 'Titanite', 'Topaz', 'Tourmaline', 'Turquoise', 'Vanadinite',
  'Wollastonite', 'Wulfenite', 'Zircon', 'Zoisite',
] as const;

/** The 88 IAU constellations, less Cancer (not a name to hand a team of teenagers). */
const CONSTELLATIONS = [
  'Andromeda', 'Antlia', 'Apus', 'Aquarius', 'Aquila', 'Ara', 'Aries', 'Auriga', 'Boötes', 'Caelum',
  'Camelopardalis', 'Canes Venatici', 'Canis Major', 'Canis Minor', 'Capricornus', 'Carina',
  'Cassiopeia', 'Centaurus', 'Cepheus', 'Cetus', 'Chamaeleon', 'Circinus', 'Columba',
  'Coma Berenices', 'Corona Australis', 'Corona Borealis', 'Corvus', 'Crater', 'Crux', 'Cygnus',
  'Delphinus', 'Dorado', 'Draco', 'Equuleus', 'Eridanus', 'Fornax', 'Gemini', 'Grus', 'Hercules',
  'Horologium', 'Hydra', 'Hydrus', 'Indus', 'Lacerta', 'Leo', 'Leo Minor', 'Lepus', 'Libra',
  'Lupus', 'Lynx', 'Lyra', 'Mensa', 'Microscopium', 'Monoceros', 'Musca', 'Norma', 'Octans',
  'Ophiuchus', 'Orion', 'Pavo', 'Pegasus', 'Perseus', 'Phoenix', 'Pictor', 'Pisces',
  'Piscis Austrinus', 'Puppis', 'Pyxis', 'Reticulum', 'Sagitta', 'Sagittarius', 'Scorpius',
  'Sculptor', 'Scutum', 'Serpens', 'Sextans', 'Taurus', 'Telescopium', 'Triangulum',
  'Triangulum Australe', 'Tucana', 'Ursa Major', 'Ursa Minor', 'Vela', 'Virgo', 'Volans',
  'Vulpecula',
] as const;

export const NAME_PACKS = {
  elements: ELEMENTS,
  minerals: MINERALS,
  constellations: CONSTELLATIONS,
} as const satisfies Record<string, readonly string[]>;

export type NamePackId = keyof typeof NAME_PACKS;

export const DEFAULT_NAME_PACK: NamePackId = 'elements';

/**
 * `count` distinct team names drawn from a pack in seeded order. Past the end of
 * the pack names repeat with a number ("Hydrogen 2") so they stay distinct.
 */
export function teamNamePack(pack: NamePackId, count: number, rng: Rng): string[] {
  if (!Number.isInteger(count) || count < 0) throw new RangeError('count must be a non-negative integer');
  const names: readonly string[] = NAME_PACKS[pack];
  if (names === undefined) throw new RangeError(`unknown name pack ${String(pack)}`);
  const order = shuffle(names, rng);
  return Array.from({ length: count }, (_, i) => {
    const round = Math.floor(i / order.length);
    return round === 0 ? order[i] : `${order[i % order.length]} ${round + 1}`;
  });
}
