/** The metals Pairwright knows, in atomic-number order: symbol, English name, atomic number (IUPAC). */
export const METALS = [
  { symbol: 'Al', name: 'aluminium', z: 13 },
  { symbol: 'Ti', name: 'titanium', z: 22 },
  { symbol: 'V', name: 'vanadium', z: 23 },
  { symbol: 'Cr', name: 'chromium', z: 24 },
  { symbol: 'Mn', name: 'manganese', z: 25 },
  { symbol: 'Fe', name: 'iron', z: 26 },
  { symbol: 'Co', name: 'cobalt', z: 27 },
  { symbol: 'Ni', name: 'nickel', z: 28 },
  { symbol: 'Cu', name: 'copper', z: 29 },
  { symbol: 'Zn', name: 'zinc', z: 30 },
  { symbol: 'Zr', name: 'zirconium', z: 40 },
  { symbol: 'Nb', name: 'niobium', z: 41 },
  { symbol: 'Mo', name: 'molybdenum', z: 42 },
  { symbol: 'Ru', name: 'ruthenium', z: 44 },
  { symbol: 'Rh', name: 'rhodium', z: 45 },
  { symbol: 'Pd', name: 'palladium', z: 46 },
  { symbol: 'Ag', name: 'silver', z: 47 },
  { symbol: 'Cd', name: 'cadmium', z: 48 },
  { symbol: 'In', name: 'indium', z: 49 },
  { symbol: 'Sn', name: 'tin', z: 50 },
  { symbol: 'Hf', name: 'hafnium', z: 72 },
  { symbol: 'Ta', name: 'tantalum', z: 73 },
  { symbol: 'W', name: 'tungsten', z: 74 },
  { symbol: 'Re', name: 'rhenium', z: 75 },
  { symbol: 'Os', name: 'osmium', z: 76 },
  { symbol: 'Ir', name: 'iridium', z: 77 },
  { symbol: 'Pt', name: 'platinum', z: 78 },
  { symbol: 'Au', name: 'gold', z: 79 },
  { symbol: 'Pb', name: 'lead', z: 82 },
  { symbol: 'Bi', name: 'bismuth', z: 83 },
] as const;

export type MetalSymbol = (typeof METALS)[number]['symbol'];

export const METAL_SYMBOLS: readonly MetalSymbol[] = METALS.map((metal) => metal.symbol);

export function isMetalSymbol(value: string): value is MetalSymbol {
  return (METAL_SYMBOLS as readonly string[]).includes(value);
}
