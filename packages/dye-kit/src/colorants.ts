// Certified food colors: FDA, 21 CFR Part 74 Subpart A; EU numbers from Regulation (EC)
// No 1333/2008, Annex II (from memory). Absorption maxima are typical literature values (from
// memory): the wavelength a dye absorbs, for a spectral model only, never a swatch's hue.

export type ColorantId = 'blue1' | 'blue2' | 'green3' | 'red3' | 'red40' | 'yellow5' | 'yellow6';

export interface Colorant {
  id: ColorantId;
  /** US name, e.g. "FD&C Blue No. 1". */
  fdcName: string;
  /** The same colorant's EU food additive number, e.g. "E133". */
  euNumber: string;
  /** The color it looks in the bottle, in plain words. */
  looks: 'blue' | 'green' | 'red' | 'yellow' | 'orange' | 'pink';
  absorptionMaxNm: number;
  /** Whether the US still lists it for food; a dye pot is never food either way. */
  listedForFood: boolean;
  /** Blue food color tends to exhaust last and slowest (common practice). */
  exhaustsSlowly: boolean;
  note?: string;
}

export const COLORANTS: readonly Colorant[] = [
  {
    id: 'blue1',
    fdcName: 'FD&C Blue No. 1',
    euNumber: 'E133',
    looks: 'blue',
    absorptionMaxNm: 630,
    listedForFood: true,
    exhaustsSlowly: true,
  },
  {
    id: 'blue2',
    fdcName: 'FD&C Blue No. 2',
    euNumber: 'E132',
    looks: 'blue',
    absorptionMaxNm: 610,
    listedForFood: true,
    exhaustsSlowly: true,
  },
  {
    id: 'green3',
    fdcName: 'FD&C Green No. 3',
    euNumber: 'E143',
    looks: 'green',
    absorptionMaxNm: 625,
    listedForFood: true,
    exhaustsSlowly: false,
  },
  {
    id: 'red3',
    fdcName: 'FD&C Red No. 3',
    euNumber: 'E127',
    looks: 'pink',
    absorptionMaxNm: 527,
    listedForFood: false,
    exhaustsSlowly: false,
    // From memory: FDA revoked its food listing in January 2025, effective for food in 2027.
    note: 'FDA revoked its listing for food in January 2025 (food makers have until 2027); older bottles may still contain it.',
  },
  {
    id: 'red40',
    fdcName: 'FD&C Red No. 40',
    euNumber: 'E129',
    looks: 'red',
    absorptionMaxNm: 504,
    listedForFood: true,
    exhaustsSlowly: false,
  },
  {
    id: 'yellow5',
    fdcName: 'FD&C Yellow No. 5',
    euNumber: 'E102',
    looks: 'yellow',
    absorptionMaxNm: 427,
    listedForFood: true,
    exhaustsSlowly: false,
  },
  {
    id: 'yellow6',
    fdcName: 'FD&C Yellow No. 6',
    euNumber: 'E110',
    looks: 'orange',
    absorptionMaxNm: 482,
    listedForFood: true,
    exhaustsSlowly: false,
  },
];

/** The colorant with this id; undefined for an unknown id. */
export function colorantById(id: string): Colorant | undefined {
  return COLORANTS.find((c) => c.id === id);
}
