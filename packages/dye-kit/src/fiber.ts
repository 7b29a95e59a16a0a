import { DyeKitError, requirePositive } from './errors.ts';
import type { DyeKitWarning } from './warning.ts';

export type FiberName =
  | 'wool'
  | 'alpaca'
  | 'mohair'
  | 'silk'
  | 'angora'
  | 'cashmere'
  | 'yak'
  | 'nylon'
  | 'cotton'
  | 'linen'
  | 'bambooViscose'
  | 'acrylic'
  | 'polyester';

export type FiberClass = 'protein' | 'polyamide' | 'cellulose' | 'synthetic';

// Common practice: acid dyes and food color bond to protein fibers and nylon (a polyamide)
// under acid and heat; cellulose and acrylic/polyester need other dye classes.
const FIBERS: Record<FiberName, { fiberClass: FiberClass; felts: boolean }> = {
  wool: { fiberClass: 'protein', felts: true },
  alpaca: { fiberClass: 'protein', felts: true },
  mohair: { fiberClass: 'protein', felts: true },
  silk: { fiberClass: 'protein', felts: false },
  angora: { fiberClass: 'protein', felts: true },
  cashmere: { fiberClass: 'protein', felts: true },
  yak: { fiberClass: 'protein', felts: true },
  nylon: { fiberClass: 'polyamide', felts: false },
  cotton: { fiberClass: 'cellulose', felts: false },
  linen: { fiberClass: 'cellulose', felts: false },
  bambooViscose: { fiberClass: 'cellulose', felts: false },
  acrylic: { fiberClass: 'synthetic', felts: false },
  polyester: { fiberClass: 'synthetic', felts: false },
};

export const FIBER_NAMES = Object.keys(FIBERS) as FiberName[];

export interface FiberPart {
  fiber: FiberName;
  pct: number;
}

export interface FiberCheck {
  fibers: Array<FiberPart & { fiberClass: FiberClass; takesAcidDye: boolean }>;
  /** Percent of the yarn that takes acid dyes and food color. */
  takesDyePct: number;
  /** Percent that stays undyed (or nearly) with acid dyes and food color. */
  doesNotTakePct: number;
  warnings: DyeKitWarning[];
}

/** Whether a fiber takes acid dyes and food color. */
export function takesAcidDye(fiber: FiberName): boolean {
  const fiberClass = FIBERS[fiber]?.fiberClass;
  return fiberClass === 'protein' || fiberClass === 'polyamide';
}

/**
 * Which part of a yarn takes acid dyes and food color, with warnings for blends, superwash
 * and felting. Percentages must add up to 100.
 */
export function fiberCheck(
  fiberContent: ReadonlyArray<FiberPart>,
  options: { superwash?: boolean } = {},
): FiberCheck {
  if (!Array.isArray(fiberContent as unknown) || fiberContent.length === 0) {
    throw new DyeKitError('INVALID_FIBER_CONTENT', 'List at least one fiber.', 'fiberContent');
  }
  const seen = new Set<string>();
  const fibers = fiberContent.map((part, i) => {
    const known = FIBERS[part.fiber];
    if (known === undefined) {
      throw new DyeKitError(
        'INVALID_FIBER_CONTENT',
        `Unknown fiber "${String(part.fiber)}".`,
        `fiberContent[${i}].fiber`,
      );
    }
    if (seen.has(part.fiber)) {
      throw new DyeKitError(
        'INVALID_FIBER_CONTENT',
        `${part.fiber} is listed twice.`,
        `fiberContent[${i}].fiber`,
      );
    }
    seen.add(part.fiber);
    requirePositive(`fiberContent[${i}].pct`, part.pct);
    return {
      fiber: part.fiber,
      pct: part.pct,
      fiberClass: known.fiberClass,
      takesAcidDye: takesAcidDye(part.fiber),
    };
  });
  const totalPct = fibers.reduce((sum, f) => sum + f.pct, 0);
  if (Math.abs(totalPct - 100) > 0.01) {
    throw new DyeKitError(
      'INVALID_FIBER_CONTENT',
      `Fiber percentages add up to ${totalPct}, not 100.`,
      'fiberContent',
    );
  }
  const takesDyePct = fibers.filter((f) => f.takesAcidDye).reduce((sum, f) => sum + f.pct, 0);
  const doesNotTakePct = 100 - takesDyePct;
  const warnings: DyeKitWarning[] = [];

  if (takesDyePct === 0) {
    warnings.push({
      code: 'FIBER_TAKES_NO_DYE',
      severity: 'critical',
      message:
        'This yarn will not take acid dyes or food color: they need wool or another animal fiber, silk, or nylon.',
    });
  } else if (doesNotTakePct > 0) {
    const others = fibers
      .filter((f) => !f.takesAcidDye)
      .map((f) => `${f.pct} % ${fiberLabel(f.fiber)}`);
    warnings.push({
      code: 'FIBER_BLEND',
      severity: 'warning',
      message: `Only ${takesDyePct} % of this yarn takes the color; the ${others.join(' and ')} stays pale, so expect a lighter, heathered result.`,
    });
  }
  const hasFeltingFiber = fibers.some((f) => FIBERS[f.fiber].felts);
  if (options.superwash === true && hasFeltingFiber) {
    warnings.push({
      code: 'SUPERWASH_STRIKES_FAST',
      severity: 'info',
      message:
        'Superwash wool takes dye fast and can strike unevenly: add color to the bath slowly and move the yarn gently at first.',
    });
  } else if (options.superwash !== true && hasFeltingFiber) {
    warnings.push({
      code: 'WOOL_FELTS',
      severity: 'warning',
      message:
        'This fiber felts if shocked or agitated: no sudden changes from hot to cold, no rubbing or wringing, and keep stirring gentle.',
    });
  }
  return { fibers, takesDyePct, doesNotTakePct, warnings };
}

function fiberLabel(fiber: FiberName): string {
  return fiber === 'bambooViscose' ? 'bamboo viscose' : fiber;
}
