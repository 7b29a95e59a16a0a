/** How much a warning matters: `info` is a tip, `warning` changes the result, `critical` stops it. */
export type Severity = 'info' | 'warning' | 'critical';

/** Every warning dye-kit returns; `code` is stable, `message` is plain US English for the viewer. */
export interface DyeKitWarning {
  code: WarningCode;
  severity: Severity;
  message: string;
  /** Index of the recipe line the warning is about, when it is about one line. */
  lineIndex?: number;
}

export type WarningCode =
  | 'AMOUNT_TOO_SMALL'
  | 'ROUNDING_CHANGES_RESULT'
  | 'POT_TOO_SMALL'
  | 'SPLIT_INTO_BATCHES'
  | 'DEPTH_OF_SHADE_HIGH'
  | 'COLOR_MAY_BREAK'
  | 'BLUE_EXHAUSTS_SLOWLY'
  | 'ALUMINUM_POT'
  | 'BOILING'
  | 'SIMMER_CUES'
  | 'STRONG_VINEGAR'
  | 'MIX_MAY_BE_MUDDY'
  | 'ALREADY_DILUTE'
  | 'FIBER_TAKES_NO_DYE'
  | 'FIBER_BLEND'
  | 'SUPERWASH_STRIKES_FAST'
  | 'WOOL_FELTS';
