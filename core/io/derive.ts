import { phaseRadians, storageAndLossOf, tanDeltaOf } from '../data/derived';
import type { Isotherm, QuantityId } from '../data/types';

/**
 * Fills quantities that follow from others, point by point, where they are missing (the rules of
 * core/data/derived.ts, docs/conventions.md §1):
 * G' = |G*| cos δ and G'' = |G*| sin δ from |G*| with δ (degrees) or tan δ (δ = atan tan δ);
 * tan δ = G''/G' from G' and G''. Measured values are never overwritten. Returns what was filled.
 */
export function deriveQuantities(iso: Isotherm): QuantityId[] {
  const q = iso.quantities;
  const n = iso.x.length;
  const filled = new Set<QuantityId>();
  const get = (id: QuantityId): number[] => (q[id] ??= new Array<number>(n).fill(NaN));
  const modulus = q.complexModulus;
  if (modulus && (q.phaseAngle || q.tanDelta)) {
    const delta = q.phaseAngle;
    const tan = q.tanDelta;
    for (let i = 0; i < n; i++) {
      const m = modulus[i];
      const d = phaseRadians(delta?.[i], tan?.[i]);
      if (!Number.isFinite(m) || !Number.isFinite(d)) continue;
      const [storage, loss] = storageAndLossOf(m, d);
      if (!Number.isFinite(q.storageModulus?.[i] ?? NaN)) {
        get('storageModulus')[i] = storage;
        filled.add('storageModulus');
      }
      if (!Number.isFinite(q.lossModulus?.[i] ?? NaN)) {
        get('lossModulus')[i] = loss;
        filled.add('lossModulus');
      }
    }
  }
  const gp = q.storageModulus;
  const gpp = q.lossModulus;
  if (gp && gpp) {
    for (let i = 0; i < n; i++) {
      if (Number.isFinite(q.tanDelta?.[i] ?? NaN)) continue;
      const t = tanDeltaOf(gp[i], gpp[i]);
      if (!Number.isFinite(t)) continue;
      get('tanDelta')[i] = t;
      filled.add('tanDelta');
    }
  }
  return [...filled];
}
