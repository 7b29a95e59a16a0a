import { DyeKitError, requireFinite, requireNonNegative, requirePositive } from './errors.ts';

export type MassUnit = 'g' | 'oz' | 'lb';
export type VolumeUnit =
  | 'mL'
  | 'L'
  | 'tsp'
  | 'tbsp'
  | 'cup'
  | 'floz'
  | 'gal'
  | 'metricTsp'
  | 'metricTbsp'
  | 'metricCup'
  | 'drop';
export type LengthUnit = 'm' | 'yd';
export type Unit = MassUnit | VolumeUnit | LengthUnit;
export type Dimension = 'mass' | 'volume' | 'length';

/** One US teaspoon in mL (NIST Handbook 44 App. C; NIST SP 811): exact. */
export const US_TSP_ML = 4.92892159375;
/** One US tablespoon in mL (½ US fl oz): exact. */
export const US_TBSP_ML = 14.78676478125;
/** One US customary cup in mL (1/16 gal): exact. Nutrition labels use 240 mL instead (21 CFR 101.9). */
export const US_CUP_ML = 236.5882365;
/** One US fluid ounce in mL (1/128 gal): exact. */
export const US_FLOZ_ML = 29.5735295625;
/** One US gallon in mL (231 in³): exact. */
export const US_GAL_ML = 3785.411784;
/** Metric kitchen measures (common metric convention). */
export const METRIC_TSP_ML = 5;
export const METRIC_TBSP_ML = 15;
export const METRIC_CUP_ML = 250;
/** A medicine dropper gives about 20 drops of water per mL (USP <1101>, from memory); approximate. */
export const DEFAULT_DROPS_PER_ML = 20;

interface UnitDef {
  dimension: Dimension;
  /** Size of one unit in the dimension's base unit (g, mL, m). Absent for drops (calibrated). */
  toBase?: number;
}

const UNITS: Record<Unit, UnitDef> = {
  g: { dimension: 'mass', toBase: 1 },
  // Avoirdupois ounce and pound (NIST SP 811): exact.
  oz: { dimension: 'mass', toBase: 28.349523125 },
  lb: { dimension: 'mass', toBase: 453.59237 },
  mL: { dimension: 'volume', toBase: 1 },
  L: { dimension: 'volume', toBase: 1000 },
  tsp: { dimension: 'volume', toBase: US_TSP_ML },
  tbsp: { dimension: 'volume', toBase: US_TBSP_ML },
  cup: { dimension: 'volume', toBase: US_CUP_ML },
  floz: { dimension: 'volume', toBase: US_FLOZ_ML },
  gal: { dimension: 'volume', toBase: US_GAL_ML },
  metricTsp: { dimension: 'volume', toBase: METRIC_TSP_ML },
  metricTbsp: { dimension: 'volume', toBase: METRIC_TBSP_ML },
  metricCup: { dimension: 'volume', toBase: METRIC_CUP_ML },
  drop: { dimension: 'volume' },
  m: { dimension: 'length', toBase: 1 },
  // International yard (NIST SP 811): exact.
  yd: { dimension: 'length', toBase: 0.9144 },
};

export interface ConvertOptions {
  /** Drops per mL for this bottle; defaults to 20 (approximate). */
  dropsPerMl?: number;
  /** Density in g/mL, needed to convert between mass and volume (e.g. 1 for water). */
  densityGPerMl?: number;
}

export interface ConvertedAmount {
  value: number;
  unit: Unit;
  /** True when drops were involved: a drop's size depends on the bottle and the liquid. */
  approximate: boolean;
}

/** True when `unit` is one dye-kit knows. */
export function isUnit(unit: string): unit is Unit {
  return Object.prototype.hasOwnProperty.call(UNITS, unit);
}

/** The dimension (mass, volume, length) a unit measures; throws UNKNOWN_UNIT otherwise. */
export function dimensionOf(unit: string): Dimension {
  return unitDef(unit).dimension;
}

function unitDef(unit: string): UnitDef {
  if (!isUnit(unit)) {
    throw new DyeKitError('UNKNOWN_UNIT', `Unknown unit "${unit}".`, 'unit');
  }
  return UNITS[unit];
}

function baseSize(def: UnitDef, options: ConvertOptions): number {
  if (def.toBase !== undefined) return def.toBase;
  const dropsPerMl = requirePositive('dropsPerMl', options.dropsPerMl ?? DEFAULT_DROPS_PER_ML);
  return 1 / dropsPerMl;
}

/** Converts an amount and says whether the result is approximate (drops). */
export function convertDetailed(
  value: number,
  from: string,
  to: string,
  options: ConvertOptions = {},
): ConvertedAmount {
  requireNonNegative('value', value);
  const fromDef = unitDef(from);
  const toDef = unitDef(to);
  let base = value * baseSize(fromDef, options);
  if (fromDef.dimension !== toDef.dimension) {
    const pair = `${fromDef.dimension}:${toDef.dimension}`;
    if (options.densityGPerMl === undefined || (pair !== 'mass:volume' && pair !== 'volume:mass')) {
      throw new DyeKitError(
        'INCOMPATIBLE_UNITS',
        `Cannot convert ${from} (${fromDef.dimension}) to ${to} (${toDef.dimension})` +
          (pair === 'mass:volume' || pair === 'volume:mass' ? ' without a density.' : '.'),
        'unit',
      );
    }
    const density = requirePositive('densityGPerMl', options.densityGPerMl);
    base = pair === 'mass:volume' ? base / density : base * density;
  }
  return {
    value: base / baseSize(toDef, options),
    unit: to as Unit,
    approximate: from === 'drop' || to === 'drop',
  };
}

/** Converts `value` from one unit to another (US customary for tsp/tbsp/cup/floz/gal). */
export function convert(
  value: number,
  from: string,
  to: string,
  options: ConvertOptions = {},
): number {
  return convertDetailed(value, from, to, options).value;
}

/** Absolute zero, the one hard floor for a temperature. */
const ABSOLUTE_ZERO_C = -273.15;

export function celsiusToFahrenheit(c: number): number {
  requireFinite('celsius', c);
  if (c < ABSOLUTE_ZERO_C) {
    throw new DyeKitError('INVALID_AMOUNT', 'Temperature is below absolute zero.', 'celsius');
  }
  return (c * 9) / 5 + 32;
}

export function fahrenheitToCelsius(f: number): number {
  requireFinite('fahrenheit', f);
  const c = ((f - 32) * 5) / 9;
  if (c < ABSOLUTE_ZERO_C - 1e-9) {
    throw new DyeKitError('INVALID_AMOUNT', 'Temperature is below absolute zero.', 'fahrenheit');
  }
  return c;
}
