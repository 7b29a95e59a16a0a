import { colorantById, type Colorant } from './colorants.ts';
import { requireFinite } from './errors.ts';
import { fiberCheck, type FiberPart } from './fiber.ts';
import type { MeasureSystem } from './household.ts';
import { lineName, validateRecipe, type Recipe, type RecipeLine } from './recipe.ts';
import { scaleRecipe } from './scale.ts';
import { celsiusToFahrenheit } from './units.ts';
import type { DyeKitWarning } from './warning.ts';

/** The real pot, when known: what the viewer dyes in and how. */
export interface PotContext {
  potMaterial?: 'stainlessSteel' | 'enamel' | 'aluminum' | 'other';
  potCapacityMl?: number;
  /** How the bath is heated: held at a simmer, or brought to a boil. */
  heat?: 'simmer' | 'boil';
  /** Highest bath temperature planned or logged, °C. */
  maxTempC?: number;
  hasThermometer?: boolean;
  /** The viewer's skein, when it differs from the host's (amounts are checked at this size). */
  weightOfGoodsG?: number;
  system?: MeasureSystem;
  fiberContent?: FiberPart[];
  superwash?: boolean;
}

// Common practice: above about 4 % DOS wool does not exhaust; acid-dye baths are held hot but
// below a boil, roughly 85–95 °C.
const MAX_EXHAUSTING_DOS_PCT = 4;
const SIMMER_LOW_C = 85;
const SIMMER_HIGH_C = 95;
const BOILING_FROM_C = 98;
/** Names of colors that are usually mixtures of dyes that strike at different rates. */
const MIXED_COLOR_WORDS =
  /green|teal|turquoise|purple|violet|lavender|lilac|plum|black|brown|gray|grey|navy|olive/i;
const BLUE_WORDS = /blue|navy|teal|turquoise/i;

function looksOf(line: RecipeLine): Colorant['looks'][] {
  if (line.kind !== 'foodColor' || line.colorants === undefined) return [];
  return line.colorants.flatMap((id) => colorantById(id)?.looks ?? []);
}

function simmerCues(): string {
  return `Aim for ${SIMMER_LOW_C}–${SIMMER_HIGH_C} °C (${celsiusToFahrenheit(SIMMER_LOW_C)}–${Math.round(celsiusToFahrenheit(SIMMER_HIGH_C))} °F): steam rising steadily and tiny bubbles on the bottom and sides of the pot, but no bubbles breaking the surface.`;
}

function breakWarnings(recipe: Recipe): DyeKitWarning[] {
  const warnings: DyeKitWarning[] = [];
  recipe.lines.forEach((line, lineIndex) => {
    const mixedColorants = new Set(looksOf(line)).size > 1;
    if (mixedColorants || MIXED_COLOR_WORDS.test(lineName(line))) {
      warnings.push({
        code: 'COLOR_MAY_BREAK',
        severity: 'info',
        lineIndex,
        message: `${lineName(line)} is usually a mix of dyes that take up at different speeds and can "break" into its parts (for example blue and yellow from a green). For an even color, add it to the hot, acidified bath slowly and move the yarn gently; for a speckled look, sprinkle it on.`,
      });
    }
  });
  const families = new Set(recipe.lines.flatMap((line) => looksOf(line)));
  const mixesAcrossLines =
    (families.has('blue') &&
      (families.has('yellow') || families.has('red') || families.has('pink'))) ||
    families.size >= 3;
  if (warnings.length === 0 && mixesAcrossLines) {
    warnings.push({
      code: 'COLOR_MAY_BREAK',
      severity: 'info',
      message:
        'These colors mixed in one bath can "break": each strikes at its own speed, so the first part of the skein may take more of one. Add the mix slowly and keep the yarn moving gently.',
    });
  }
  return warnings;
}

function blueWarnings(recipe: Recipe): DyeKitWarning[] {
  return recipe.lines.flatMap((line, lineIndex): DyeKitWarning[] => {
    if (line.kind !== 'foodColor') return [];
    const slow =
      line.colorants?.some((id) => colorantById(id)?.exhaustsSlowly) ??
      BLUE_WORDS.test(line.colorName);
    if (!slow) return [];
    return [
      {
        code: 'BLUE_EXHAUSTS_SLOWLY',
        severity: 'info',
        lineIndex,
        message: `Blue food color is slow to exhaust: keep the bath hot for longer (30 minutes or more) and add a little more acid if the water stays blue.`,
      },
    ];
  });
}

/**
 * The real-pot warnings for a recipe (common practice): depth of shade over about 4 %, colors
 * that break, slow blue, amounts too small to measure, pot capacity, aluminum pots, boiling
 * instead of a simmer, and the fiber check when the fiber is known.
 */
export function recipeWarnings(recipe: Recipe, context: PotContext = {}): DyeKitWarning[] {
  validateRecipe(recipe);
  if (context.maxTempC !== undefined) requireFinite('maxTempC', context.maxTempC);
  const warnings: DyeKitWarning[] = [];
  const totalDosPct = recipe.lines.reduce(
    (sum, line) => sum + (line.kind === 'stock' ? line.depthOfShadePct : 0),
    0,
  );
  if (totalDosPct > MAX_EXHAUSTING_DOS_PCT) {
    warnings.push({
      code: 'DEPTH_OF_SHADE_HIGH',
      severity: 'warning',
      message: `${totalDosPct} % depth of shade is more than wool usually takes up (about 4 %): the bath won't clear and the extra dye will rinse out or bleed.`,
    });
  }
  warnings.push(...breakWarnings(recipe), ...blueWarnings(recipe));

  const scaled = scaleRecipe(recipe, {
    weightOfGoodsG: context.weightOfGoodsG ?? recipe.weightOfGoodsG,
    system: context.system ?? 'us',
    ...(context.potCapacityMl !== undefined ? { potCapacityMl: context.potCapacityMl } : {}),
  });
  warnings.push(...scaled.warnings);

  if (context.potMaterial === 'aluminum') {
    warnings.push({
      code: 'ALUMINUM_POT',
      severity: 'warning',
      message:
        'Aluminum reacts with the acid in the bath and can dull or shift colors. Use stainless steel or chip-free enamel, kept for dyeing only.',
    });
  }
  const boiling =
    context.heat === 'boil' ||
    (context.maxTempC !== undefined && context.maxTempC >= BOILING_FROM_C);
  if (boiling) {
    warnings.push({
      code: 'BOILING',
      severity: 'warning',
      message: `A rolling boil can felt wool and make color uneven; a simmer is enough. ${simmerCues()}`,
    });
  } else if (context.hasThermometer === false) {
    warnings.push({
      code: 'SIMMER_CUES',
      severity: 'info',
      message: `No thermometer? ${simmerCues()}`,
    });
  }
  if (context.fiberContent !== undefined) {
    warnings.push(
      ...fiberCheck(
        context.fiberContent,
        context.superwash !== undefined ? { superwash: context.superwash } : {},
      ).warnings,
    );
  }
  return warnings;
}
