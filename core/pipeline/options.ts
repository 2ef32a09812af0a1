/**
 * Options of `buildMasterCurve`: a zod schema (so settings files and app state are validated with
 * messages naming the bad key) and one `resolveAnalysisOptions()` that applies every default.
 */
import { z } from 'zod';
import { QUANTITY_IDS, type DataWarning, type QuantityId } from '../data/types';
import { extent } from '../data/extent';
import { shiftModelKinds } from '../models';
import type { ShiftModelKind } from '../models/types';
import type { HeldExpansion } from '../shift/types';

const quantityId = z.enum(QUANTITY_IDS as [QuantityId, ...QuantityId[]]);

/**
 * A registered shift-model kind (core/models registry), checked when parsed so a model
 * registered later is accepted; the issue is zod's own for an enum ("Invalid option: expected one
 * of …").
 */
export const shiftModelKindSchema = z.unknown().superRefine((value, ctx) => {
  const kinds = shiftModelKinds();
  if (typeof value !== 'string' || !kinds.includes(value))
    ctx.addIssue({ code: 'invalid_value', values: kinds, input: value });
}) as unknown as z.ZodType<ShiftModelKind>;

/** Options of one analysis. Every field is optional; defaults are applied by `resolveAnalysisOptions`. */
export const analysisOptionsSchema = z.strictObject({
  /**
   * Reference temperature Tref, K. Any temperature, measured or not.
   * @default the measured isotherm temperature closest to the middle of the included range
   */
  referenceTemperatureK: z.number().positive().optional(),
  /**
   * Quantities that drive the horizontal shift, or 'auto'.
   * @default 'auto' (the shift engine's choice for the data: see docs/cli.md)
   */
  shiftQuantities: z.union([z.literal('auto'), z.array(quantityId).min(1)]).optional(),
  /**
   * Vertical shift bT: decided from the data ('auto': bT from δ against |G*| when the data carry
   * one, else none; the density when one is given); none; the entropic estimate from density; or
   * estimated from the data. @default 'auto'
   */
  verticalShift: z.enum(['auto', 'none', 'density', 'data']).optional(),
  /**
   * Density input for `verticalShift: 'density'`: the volumetric expansion αV (1/K), and ρ at
   * Tref (kg/m³) for the record only (bT = Tref·ρref/(T·ρ(T)) depends on αV alone).
   */
  density: z
    .strictObject({
      referenceDensityKgPerM3: z.number().positive().optional(),
      volumetricExpansionPerK: z.number().min(0).max(0.01),
    })
    .optional(),
  /**
   * Shift-factor models to fit, by registry kind (fitted in the registry's order).
   * @default every registered model: wlf, arrhenius, polynomial and any added
   */
  models: z.array(shiftModelKindSchema).optional(),
  /**
   * Relaxation times per decade of the Prony series (1 or 2); 0 skips the Prony fit. 2 is the
   * default: 1 per decade can leave ripples in G″ above the 3 % RMS target (4.5–4.9 % on some
   * synthetic sets, 3.0 % against the data in tests/core/pipeline), 2 per decade stay within it.
   * @default 2
   */
  pronyModesPerDecade: z.union([z.literal(0), z.literal(1), z.literal(2)]).optional(),
  /**
   * Equilibrium modulus Ge of the Prony series: 'auto' sets Ge = 0 when the master curve reaches
   * the terminal zone of a liquid (G′ ~ ω², G″ ~ ω over the lowest decade; relaxation falling
   * faster than 1/t over the last decade), else fits it; 'fit' always fits Ge ≥ 0; 'zero' forces
   * Ge = 0. @default 'auto'
   */
  pronyEquilibrium: z.enum(['auto', 'fit', 'zero']).optional(),
  /** Glass transition temperature Tg, K: WLF constants are also re-referenced to it. @default none */
  glassTransitionK: z.number().positive().optional(),
  /** Isotherms left out of the master curve, by id (e.g. "T03"). @default [] */
  excludedIsothermIds: z.array(z.string().min(1)).optional(),
  /** Points left out, by file name and 1-based row in that file. @default [] */
  maskedPoints: z
    .array(z.strictObject({ file: z.string().min(1), row: z.number().int().positive() }))
    .optional(),
  /** Manual shifts kept locked while the rest are fitted around them: isotherm id → log10 aT. @default {} */
  lockedLog10aT: z.record(z.string(), z.number()).optional(),
});

export type AnalysisOptions = z.input<typeof analysisOptionsSchema> & {
  /** Called with a fraction 0–1 and the stage name. Not part of the settings (not serialised). */
  onProgress?: (fraction: number, stage: string) => void;
  /** Warnings from the import, carried into the analysis's warnings. Not part of the settings. */
  importWarnings?: readonly DataWarning[];
  /**
   * Warm start: log10 aT per isotherm id to start the shift engine from (e.g. the previous
   * result while a curve is dragged); with every active isotherm given, the initial scan is
   * skipped. Changes the speed, not the optimum it converges to. Not part of the settings.
   */
  warmStartLog10aT?: Readonly<Record<string, number>>;
  /**
   * Live re-fit: with verticalShift 'auto' or 'data', keep the last full fit's bT (its αV,
   * 1/K, with its standard error, or null for bT = 1) instead of fitting αV again. Not part of the settings.
   */
  heldExpansion?: HeldExpansion;
};

/** The options with every default applied: what the analysis really used. */
export interface ResolvedAnalysisOptions {
  referenceTemperatureK: number;
  /** True when Tref was chosen automatically. */
  referenceTemperatureAuto: boolean;
  shiftQuantities: 'auto' | QuantityId[];
  verticalShift: 'auto' | 'none' | 'density' | 'data';
  density: { referenceDensityKgPerM3?: number; volumetricExpansionPerK: number } | null;
  models: ShiftModelKind[];
  pronyModesPerDecade: 0 | 1 | 2;
  pronyEquilibrium: 'auto' | 'fit' | 'zero';
  glassTransitionK: number | null;
  excludedIsothermIds: string[];
  maskedPoints: { file: string; row: number }[];
  lockedLog10aT: Record<string, number>;
}

/** The built-in models; the default at run time is every registered model (`shiftModelKinds()`). */
export const DEFAULT_MODELS: ResolvedAnalysisOptions['models'] = shiftModelKinds();

/** Prony relaxation times per decade when none is given (see `pronyModesPerDecade`). */
export const DEFAULT_PRONY_MODES_PER_DECADE = 2;

/** Wrong options, with the key that is wrong and what was expected. */
export class OptionsError extends Error {
  constructor(
    message: string,
    readonly key: string,
  ) {
    super(message);
    this.name = 'OptionsError';
  }
}

/** Formats a zod issue as "key: message" with the dotted path of the key. */
export function describeIssue(issue: z.core.$ZodIssue, prefix = ''): { key: string; text: string } {
  const path = issue.path.map(String).join('.');
  let key = prefix && path ? `${prefix}.${path}` : prefix || path;
  if (issue.code === 'unrecognized_keys') {
    const keys = issue.keys.join(', ');
    key = key ? `${key}.${issue.keys[0]}` : issue.keys[0];
    return { key, text: `unknown setting ${keys}` };
  }
  return { key: key || '(top level)', text: `${key || 'settings'}: ${issue.message}` };
}

/**
 * Validates options and applies defaults. `measuredTemperaturesK` (the included isotherms'
 * temperatures) picks the default reference temperature.
 * @throws OptionsError naming the bad key
 */
export function resolveAnalysisOptions(
  options: AnalysisOptions,
  measuredTemperaturesK: readonly number[],
): ResolvedAnalysisOptions {
  const {
    onProgress: _progress,
    importWarnings: _warnings,
    warmStartLog10aT: _warmStart,
    heldExpansion: _held,
    ...rest
  } = options;
  const parsed = analysisOptionsSchema.safeParse(rest);
  if (!parsed.success) {
    const { key, text } = describeIssue(parsed.error.issues[0]);
    throw new OptionsError(`Invalid analysis option ${text}`, key);
  }
  const o = parsed.data;
  const verticalShift = o.verticalShift ?? 'auto';
  if (verticalShift === 'density' && !o.density)
    throw new OptionsError(
      'Invalid analysis option density: verticalShift "density" needs density.volumetricExpansionPerK (density.referenceDensityKgPerM3 is optional)',
      'density',
    );
  const auto = o.referenceTemperatureK === undefined;
  return {
    referenceTemperatureK: o.referenceTemperatureK ?? defaultReferenceK(measuredTemperaturesK),
    referenceTemperatureAuto: auto,
    shiftQuantities: o.shiftQuantities ?? 'auto',
    verticalShift,
    density: o.density ?? null,
    models: o.models ? [...new Set(o.models)] : shiftModelKinds(),
    pronyModesPerDecade: o.pronyModesPerDecade ?? DEFAULT_PRONY_MODES_PER_DECADE,
    pronyEquilibrium: o.pronyEquilibrium ?? 'auto',
    glassTransitionK: o.glassTransitionK ?? null,
    excludedIsothermIds: o.excludedIsothermIds ?? [],
    maskedPoints: o.maskedPoints ?? [],
    lockedLog10aT: o.lockedLog10aT ?? {},
  };
}

/**
 * The default reference temperature: the measured temperature closest to the middle of the
 * measured range, so the master curve extends about equally to both sides (common practice is a
 * measured temperature, so that aT = 1 falls on real data).
 */
export function defaultReferenceK(temperaturesK: readonly number[]): number {
  if (temperaturesK.length === 0)
    throw new OptionsError(
      'No isotherm left to pick a reference temperature from',
      'referenceTemperatureK',
    );
  const [lo, hi] = extent(temperaturesK);
  const mid = (lo + hi) / 2;
  let best = temperaturesK[0];
  for (const t of temperaturesK) if (Math.abs(t - mid) < Math.abs(best - mid) - 1e-9) best = t;
  return best;
}
