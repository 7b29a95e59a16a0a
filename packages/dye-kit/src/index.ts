// @vatside/dye-kit: the trade's computation (units, dye and acid math, scaling, color science).
// Pure functions, no I/O; every function validates its input and throws DyeKitError.

export { DyeKitError, type DyeKitErrorCode } from './errors.ts';
export type { DyeKitWarning, Severity, WarningCode } from './warning.ts';

export {
  convert,
  convertDetailed,
  dimensionOf,
  isUnit,
  celsiusToFahrenheit,
  fahrenheitToCelsius,
  DEFAULT_DROPS_PER_ML,
  US_TSP_ML,
  US_TBSP_ML,
  US_CUP_ML,
  US_FLOZ_ML,
  US_GAL_ML,
  METRIC_TSP_ML,
  METRIC_TBSP_ML,
  METRIC_CUP_ML,
  type Unit,
  type MassUnit,
  type VolumeUnit,
  type LengthUnit,
  type Dimension,
  type ConvertOptions,
  type ConvertedAmount,
} from './units.ts';
export {
  toHouseholdMeasure,
  smallestMeasureMl,
  type HouseholdMeasure,
  type HouseholdPart,
  type MeasureSystem,
} from './household.ts';

export {
  dyeMassG,
  stockVolumeMl,
  depthOfShade,
  dyeMassInStockG,
  bathVolumeMl,
  foodColorAmount,
  type FoodColorUnit,
  type FoodColorAmount,
} from './dye.ts';
export {
  recipeFromLog,
  stockShortfall,
  type LoggedRecipe,
  type RebuiltLine,
  type RebuiltRecipe,
  type StockShortfall,
} from './dye-again.ts';
export { acidFor, type AcidKind, type AcidInput, type AcidAmount } from './acid.ts';
export {
  validateRecipe,
  lineName,
  type Recipe,
  type RecipeLine,
  type StockLine,
  type FoodColorLine,
  type RecipeAcid,
} from './recipe.ts';
export { measureAtHome, ROUNDING_WARNING_PCT, type Measurement } from './measure.ts';
export {
  scaleRecipe,
  bathAmounts,
  type ScaleTarget,
  type ScaleOptions,
  type ScaledRecipe,
  type Batch,
  type BathAmounts,
  type LineAmount,
  type AcidLine,
} from './scale.ts';
export {
  lastDrop,
  mixPreview,
  type Leftover,
  type LastDropInput,
  type LastDrop,
  type MixPreview,
} from './last-drop.ts';
export {
  fiberCheck,
  takesAcidDye,
  FIBER_NAMES,
  type FiberName,
  type FiberClass,
  type FiberPart,
  type FiberCheck,
} from './fiber.ts';
export { recipeWarnings, type PotContext } from './warnings.ts';
export { COLORANTS, colorantById, type Colorant, type ColorantId } from './colorants.ts';

export {
  hexToLab,
  hexToRgb,
  labToHex,
  labToLch,
  deltaE2000,
  ksFromReflectance,
  reflectanceFromKs,
  type Lab,
} from './color.ts';
export {
  extractPalette,
  paletteCloseness,
  closenessBand,
  type Swatch,
  type PixelInput,
  type PaletteOptions,
  type PaletteCloseness,
  type ClosenessBand,
} from './palette.ts';
export { describeColor, type ColorDescription, type HueName } from './names.ts';
