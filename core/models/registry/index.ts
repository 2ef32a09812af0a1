/**
 * The shift-model registry: every layer (settings, fits, summary, CSV, report, charts, CLI, app)
 * lists and names shift models from here, never by spelling out kinds. A new model is one
 * descriptor file in this folder and one line in `BUILT_IN` (docs/architecture.md, "Adding a
 * shift model"); `registerShiftModel` adds one at run time (tests, plug-ins) in the same way.
 */
import type { ShiftFitCommon, ShiftModelKind } from '../types';
import { arrheniusModel } from './arrhenius';
import type { ShiftModelDescriptor } from './descriptor';
import { polynomialModel } from './polynomial';
import { wlfModel } from './wlf';

export type {
  ShiftModelDerived,
  ShiftModelDerivedRow,
  ShiftModelDescriptor,
  ShiftModelParameter,
  ShiftModelValidity,
} from './descriptor';
export type { WlfDerived } from './wlf';

/**
 * Any registered descriptor. Its methods take their model's own fit and derived types; the
 * layers only hand a descriptor what the same descriptor made (method parameters are bivariant).
 */
export type AnyShiftModelDescriptor = ShiftModelDescriptor;

/** The built-in models, in the order the app, the summary and the exports list them. */
const BUILT_IN: readonly AnyShiftModelDescriptor[] = [wlfModel, arrheniusModel, polynomialModel];

const registry = new Map<ShiftModelKind, AnyShiftModelDescriptor>(BUILT_IN.map((d) => [d.kind, d]));

/** Keys that name something else in an analysis's `models` object. */
const RESERVED = new Set(['hint']);

/**
 * Adds a shift model to the registry (after the built-in ones) and returns the function that
 * removes it again. Throws naming the problem when the kind is taken, malformed or reserved, or
 * when the output names do not match the law's constants.
 */
export function registerShiftModel<F extends ShiftFitCommon, D extends object>(
  descriptor: ShiftModelDescriptor<F, D>,
): () => void {
  const { kind } = descriptor;
  if (!/^[a-z][a-z0-9-]*$/.test(kind))
    throw new RangeError(`shift-model kind "${kind}" must be lower case letters, digits and "-"`);
  if (RESERVED.has(kind)) throw new RangeError(`shift-model kind "${kind}" is reserved`);
  if (registry.has(kind)) throw new RangeError(`shift-model kind "${kind}" is already registered`);
  if (descriptor.law.kind !== kind)
    throw new RangeError(
      `shift model "${kind}": its law is registered as "${descriptor.law.kind}"`,
    );
  if (descriptor.parameters.length !== descriptor.law.parameters.length)
    throw new RangeError(
      `shift model "${kind}": ${descriptor.parameters.length} output names for ${descriptor.law.parameters.length} constants of its law`,
    );
  registry.set(kind, descriptor);
  return () => {
    if (registry.get(kind) === descriptor) registry.delete(kind);
  };
}

/** The registered models, built-in first, in registration order. */
export function shiftModels(): AnyShiftModelDescriptor[] {
  return [...registry.values()];
}

/** The registered kinds, in the order of `shiftModels()`. */
export function shiftModelKinds(): ShiftModelKind[] {
  return [...registry.keys()];
}

/** The descriptor of `kind`, or undefined when no such model is registered. */
export function findShiftModel(kind: string): AnyShiftModelDescriptor | undefined {
  return registry.get(kind);
}

/** The descriptor of `kind`; throws naming the kind and the registered ones when there is none. */
export function shiftModel(kind: string): AnyShiftModelDescriptor {
  const d = registry.get(kind);
  if (!d)
    throw new RangeError(
      `unknown shift model "${kind}" (registered: ${shiftModelKinds().join(', ')})`,
    );
  return d;
}

/** The kinds as a list in words: "wlf, arrhenius or polynomial" (`last` = 'or' / 'and'). */
export function shiftModelKindList(last: 'or' | 'and' = 'or'): string {
  const k = shiftModelKinds();
  return k.length < 2 ? k.join('') : `${k.slice(0, -1).join(', ')} ${last} ${k[k.length - 1]}`;
}
