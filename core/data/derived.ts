/**
 * Quantities that follow from others, defined once (docs/conventions.md §1): |G*| = √(G′² + G″²),
 * δ = atan2(G″, G′), tan δ = G″/G′, and back G′ = |G*| cos δ, G″ = |G*| sin δ. Precedence
 * everywhere: a measured (stored) quantity wins; it is derived from G′ and G″ only when it was
 * not measured. |G*| and δ are what the instrument measures first, so a measured pair is never
 * replaced by one recomputed from rounded G′ and G″.
 */
import type { QuantityId } from './types';

const DEG = Math.PI / 180;

/** |G*| = √(G′² + G″²). Not Math.hypot: several times slower, and moduli never overflow here. */
export function complexModulusOf(storage: number, loss: number): number {
  return Math.sqrt(storage * storage + loss * loss);
}

/** δ = atan2(G″, G′), degrees. */
export function phaseAngleOf(storage: number, loss: number): number {
  return (Math.atan2(loss, storage) * 180) / Math.PI;
}

/** tan δ = G″ / G′. */
export function tanDeltaOf(storage: number, loss: number): number {
  return loss / storage;
}

/** G′ = |G*| cos δ and G″ = |G*| sin δ, δ in radians. */
export function storageAndLossOf(modulus: number, deltaRad: number): [number, number] {
  return [modulus * Math.cos(deltaRad), modulus * Math.sin(deltaRad)];
}

/** δ in radians from δ in degrees where it is finite, else from tan δ (δ = atan tan δ); NaN when neither. */
export function phaseRadians(
  phaseAngleDeg: number | undefined,
  tanDelta: number | undefined,
): number {
  if (phaseAngleDeg !== undefined && Number.isFinite(phaseAngleDeg)) return phaseAngleDeg * DEG;
  return tanDelta !== undefined ? Math.atan(tanDelta) : NaN;
}

/**
 * The values of a quantity at every point: the stored (measured) array when there is one, else
 * derived point by point — tan δ, |G*| and δ from G′ and G″; without them tan δ from δ and δ
 * from tan δ; |η*| = |G*|/ω when the abscissa `x` (ω, rad/s) is given. Undefined when neither.
 */
export function quantityValues(
  q: QuantityId,
  quantities: Partial<Record<QuantityId, number[]>>,
  x?: readonly number[],
): number[] | undefined {
  const stored = quantities[q];
  if (stored) return stored;
  const gp = quantities.storageModulus;
  const gpp = quantities.lossModulus;
  const both = gp && gpp;
  switch (q) {
    case 'tanDelta':
      if (both) return gp.map((v, i) => tanDeltaOf(v, gpp[i]));
      return quantities.phaseAngle?.map((d) => Math.tan((d * Math.PI) / 180));
    case 'phaseAngle':
      if (both) return gp.map((v, i) => phaseAngleOf(v, gpp[i]));
      return quantities.tanDelta?.map((t) => (Math.atan(t) * 180) / Math.PI);
    case 'complexModulus':
      return both ? gp.map((v, i) => complexModulusOf(v, gpp[i])) : undefined;
    case 'complexViscosity': {
      if (!x) return undefined;
      const gs = quantityValues('complexModulus', quantities);
      return gs?.map((g, i) => g / x[i]);
    }
    default:
      return undefined;
  }
}
