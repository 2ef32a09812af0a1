import { expect } from 'vitest';

/** |actual − expected| ≤ delta: for quantities in log space (log10 aT, decades). */
export function expectAbsClose(actual: number, expected: number, delta: number, what = ''): void {
  const ok = Math.abs(actual - expected) <= delta;
  expect(ok, `${what} expected ${expected} ± ${delta}, got ${actual}`).toBe(true);
}

/** |actual − expected| ≤ rel·|expected|: for quantities that span decades (moduli, viscosities). */
export function expectRelClose(actual: number, expected: number, rel: number, what = ''): void {
  const ok = Math.abs(actual - expected) <= rel * Math.abs(expected);
  expect(ok, `${what} expected ${expected} within ${rel * 100} %, got ${actual}`).toBe(true);
}
