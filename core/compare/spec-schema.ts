/**
 * Specification bands as our own versioned JSON (`*.spec.json`): the criteria a sample must meet
 * against the reference lot. Validated with zod like the settings file; a newer format version is
 * refused with a message saying so. Temperatures in °C (number) as in the settings file; reduced
 * abscissae in rad/s (oscillatory) or s (relaxation) at the comparison's reference temperature.
 *
 *   { "format": "thermoshift-spec", "formatVersion": 1, "name": text, "invented"?: boolean,
 *     "referenceTemperature"?: °C, "criteria": [ … ] }
 *
 * Criteria (each may carry an "id" to name it in reports; otherwise one is made up):
 * - curve: { kind, quantity, reducedRange: [from, to], tolerancePercent | lowerPercent+upperPercent }
 * - timeShift: { kind, maxDecades }   (the horizontal offset between the curves)
 * - modulusLevel: { kind, tolerancePercent }   (the vertical offset)
 * - activationEnergy: { kind, toleranceKJPerMol }   (Arrhenius Ea difference)
 * - shiftFactor: { kind, temperature, toleranceDecades }   (log10 aT at that temperature)
 * - indicator: { kind, key, tolerancePercent }   (η0, crossover, plateau, tan δ peak …)
 */
import { ZERO_CELSIUS_K } from '../data/temperature';
import { z } from 'zod';
import { QUANTITY_IDS, type QuantityId } from '../data/types';

export const SPEC_FORMAT = 'thermoshift-spec';
export const SPEC_FORMAT_VERSION = 1;

const quantityId = z.enum(QUANTITY_IDS as [QuantityId, ...QuantityId[]]);
const id = z.string().min(1).max(60).optional();
const percent = z.number().positive().max(1000);

const curveCriterion = z
  .strictObject({
    kind: z.literal('curve'),
    id,
    quantity: quantityId,
    reducedRange: z.tuple([z.number().positive(), z.number().positive()]),
    tolerancePercent: percent.optional(),
    lowerPercent: z.number().positive().max(99.9).optional(),
    upperPercent: percent.optional(),
  })
  .refine(
    (c) =>
      c.tolerancePercent !== undefined ||
      (c.lowerPercent !== undefined && c.upperPercent !== undefined),
    { message: 'give tolerancePercent, or both lowerPercent and upperPercent' },
  );

export const specCriterionSchema = z.union([
  curveCriterion,
  z.strictObject({ kind: z.literal('timeShift'), id, maxDecades: z.number().positive() }),
  z.strictObject({ kind: z.literal('modulusLevel'), id, tolerancePercent: percent }),
  z.strictObject({
    kind: z.literal('activationEnergy'),
    id,
    toleranceKJPerMol: z.number().positive(),
  }),
  z.strictObject({
    kind: z.literal('shiftFactor'),
    id,
    temperature: z.number().min(-ZERO_CELSIUS_K),
    toleranceDecades: z.number().positive(),
  }),
  z.strictObject({
    kind: z.literal('indicator'),
    id,
    key: z.string().min(1),
    tolerancePercent: percent,
  }),
]);

export const specSchema = z.strictObject({
  format: z.literal(SPEC_FORMAT),
  formatVersion: z.literal(SPEC_FORMAT_VERSION),
  name: z.string().min(1),
  /** True for the invented demo specifications. */
  invented: z.boolean().optional(),
  /** Free text shown in reports. */
  note: z.string().optional(),
  /** Common reference temperature, °C. @default the reference analysis's own */
  referenceTemperature: z.number().min(-ZERO_CELSIUS_K).optional(),
  criteria: z.array(specCriterionSchema).min(1),
});

export type Specification = z.infer<typeof specSchema>;
export type SpecCriterion = z.infer<typeof specCriterionSchema>;

/** A specification file that cannot be used; the message names the file and the entry. */
export class SpecError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'SpecError';
  }
}

/** Parses and validates a specification; `source` (a file name) is named in every message. */
export function parseSpecification(text: string, source: string): Specification {
  let raw: unknown;
  try {
    raw = JSON.parse(text);
  } catch (e) {
    throw new SpecError(`${source}: not valid JSON (${(e as Error).message})`);
  }
  const head = z.object({ format: z.string(), formatVersion: z.number() }).safeParse(raw);
  if (!head.success || head.data.format !== SPEC_FORMAT)
    throw new SpecError(
      `${source}: not a Thermoshift specification (no "format": "${SPEC_FORMAT}")`,
    );
  if (head.data.formatVersion > SPEC_FORMAT_VERSION)
    throw new SpecError(
      `${source}: specification format ${head.data.formatVersion} is newer than this Thermoshift reads (${SPEC_FORMAT_VERSION}); please update`,
    );
  const parsed = specSchema.safeParse(raw);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    const where = issue.path.map(String).join('.') || 'file';
    throw new SpecError(`${source}: ${where}: ${issue.message}`);
  }
  return parsed.data;
}

/** The criterion's name in tables and reports: its id, or one made from its kind. */
export function criterionName(c: SpecCriterion, index: number): string {
  if (c.id) return c.id;
  switch (c.kind) {
    case 'curve':
      return `${c.quantity} band`;
    case 'indicator':
      return `${c.key}`;
    case 'shiftFactor':
      return `shift at ${c.temperature} °C`;
    default:
      return `${c.kind}${index > 0 ? ` ${index + 1}` : ''}`;
  }
}
