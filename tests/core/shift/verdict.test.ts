/**
 * One consistent superposition verdict: over seeded sets of invented, thermorheologically simple
 * materials (different spectra, shift laws, temperature spacings, point densities, noise levels,
 * with and without an entropic bT) the grade is always good; a two-component blend, a bT left out
 * and a G′/G″ disagreement are always fair or poor; and the wording of a fair or poor verdict
 * gives exactly the figures that set it.
 */
import { describe, expect, it } from 'vitest';
import { shiftIsotherms } from '../../../core/shift';
import { syntheticIsotherms } from '../../../core/synthetic';
import {
  BLEND,
  MELT_ARRHENIUS,
  MELT_WLF_PB,
  MELT_WLF_UNIVERSAL,
  RELAX_WLF,
  RUBBER_WLF,
} from './fixtures';

const density = { referenceDensity: 900, volumetricExpansionPerK: 6e-4 };

describe('superposition verdict', () => {
  it('never calls a simple material fair or poor (240 seeded sets, 1–8 % noise)', () => {
    const bad: string[] = [];
    let sets = 0;
    for (const c of [MELT_ARRHENIUS, MELT_WLF_PB, MELT_WLF_UNIVERSAL, RUBBER_WLF, RELAX_WLF])
      for (const noise of [0.01, 0.02, 0.04, 0.08])
        for (const pointsPerDecade of [5, 8])
          for (const seed of [1, 2, 3, 4, 5, 6]) {
            const withBT = seed % 2 === 0 && c.options.testKind === 'oscillatory';
            const { dataset } = syntheticIsotherms({
              ...c.options,
              pointsPerDecade,
              relativeNoise: noise,
              seed: 1000 * pointsPerDecade + seed,
              ...(withBT && { density }),
            });
            const r = shiftIsotherms(dataset, { referenceK: c.options.referenceK });
            sets++;
            if (r.checks.grade !== 'good')
              bad.push(
                `${c.name} ${noise} ${pointsPerDecade}/dec seed ${seed}: ${r.checks.grade} m=${r.checks.mismatchRatio?.toFixed(2)} v=${r.checks.vanGurpPalmenRatio?.toFixed(2)} d=${r.checks.quantityDisagreementDecades?.toFixed(3)} z=${r.checks.quantityDisagreementZ?.toFixed(1)} ${r.vertical.chosen}`,
              );
          }
    expect(sets).toBe(240);
    // Measured: 240/240 good (the target: never fair or poor). The rubber sets at 1 %
    // noise with bT from the data that were fair before came from an αV fitted 1.3–2× too high;
    // with αV now unbiased they are good.
    expect(bad, bad.join('\n')).toEqual([]);
  });

  it('calls a two-component blend fair or poor (20 seeds at 2 %, 20 at 8 % noise)', () => {
    const flagged: Record<number, number> = { 0.02: 0, 0.08: 0 };
    for (const noise of [0.02, 0.08])
      for (let seed = 1; seed <= 20; seed++) {
        const { dataset } = syntheticIsotherms({ ...BLEND.options, relativeNoise: noise, seed });
        const r = shiftIsotherms(dataset, { referenceK: BLEND.options.referenceK });
        if (r.checks.grade === 'fair' || r.checks.grade === 'poor') flagged[noise]++;
      }
    // Measured: 20/20 at 2 % and 20/20 at 8 %. At 8 % the G′ and G″ shifts differ by ~0.15
    // decades at only 2.6–5 of their standard errors and the mismatch stays near the noise, but
    // the moduli call for a vertical shift no thermal expansion gives (αV at −1/Tref, 8–15
    // standard errors from bT ≡ 1), which grades them fair.
    expect(flagged[0.02]).toBe(20);
    expect(flagged[0.08]).toBe(20);
  });

  it('calls data with a bT that was turned off fair or poor, and says so', () => {
    for (let seed = 1; seed <= 4; seed++) {
      const { dataset } = syntheticIsotherms({
        ...MELT_WLF_PB.options,
        relativeNoise: 0.02,
        seed,
        density,
      });
      const r = shiftIsotherms(dataset, {
        referenceK: MELT_WLF_PB.options.referenceK,
        vertical: 'none',
      });
      expect(['fair', 'poor']).toContain(r.checks.grade);
      const w = r.warnings.find((x) => /superposition/.test(x.code));
      expect(w?.message).toMatch(/vertical shift of up to 0\.0\d\d decades/);
    }
  });

  it('calls a G′/G″ shift disagreement fair or poor (20 seeds × 2 melts at 2 % and at 8 % noise)', () => {
    // G″ taken from a twin data set whose shift law is stronger: ×1.2 (Ea 72 instead of 60 kJ/mol,
    // WLF C1 ×1.2) at 2 % noise, ×1.5 at 8 % — G′ and G″ then call for shifts up to about 0.1–0.13
    // decades apart at the ends (0.3 decades at ×1.5). Measured: 40/40 fair or poor at each noise
    // level, the disagreement 11–16 combined errors at 2 %, 7–16 at 8 % (a ×1.2 law at 8 % noise
    // sits at 2–8 errors and is not always caught).
    for (const [noise, factor] of [
      [0.02, 1.2],
      [0.08, 1.5],
    ] as const)
      for (const c of [MELT_ARRHENIUS, MELT_WLF_PB]) {
        const law = c.options.components[0].law;
        const stronger =
          law.kind === 'arrhenius'
            ? { ...law, activationEnergyJPerMol: law.activationEnergyJPerMol * factor }
            : law.kind === 'wlf'
              ? { ...law, c1: law.c1 * factor }
              : law;
        for (let seed = 1; seed <= 20; seed++) {
          const a = syntheticIsotherms({ ...c.options, relativeNoise: noise, seed });
          const b = syntheticIsotherms({
            ...c.options,
            components: [{ ...c.options.components[0], law: stronger }],
            relativeNoise: noise,
            seed: seed + 1000,
          });
          const dataset = {
            ...a.dataset,
            isotherms: a.dataset.isotherms.map((iso, k) => ({
              ...iso,
              quantities: {
                storageModulus: iso.quantities.storageModulus,
                lossModulus: b.dataset.isotherms[k].quantities.lossModulus,
              },
            })),
          };
          const r = shiftIsotherms(dataset, { referenceK: c.options.referenceK });
          expect(['fair', 'poor'], `${c.name} ${noise} seed ${seed}`).toContain(r.checks.grade);
          expect(
            r.checks.quantityDisagreementZ!,
            `${c.name} ${noise} seed ${seed}`,
          ).toBeGreaterThan(4.5);
        }
      }
  });

  it('words a fair or poor verdict with the figures that set it, never a ratio below its threshold', () => {
    for (let seed = 1; seed <= 4; seed++) {
      const { dataset } = syntheticIsotherms({ ...BLEND.options, relativeNoise: 0.02, seed });
      const r = shiftIsotherms(dataset, { referenceK: BLEND.options.referenceK });
      const w = r.warnings.find((x) => /superposition/.test(x.code))!;
      expect(w.code).toBe(`${r.checks.grade}-superposition`);
      for (const m of w.message.matchAll(/(\d+\.\d)× the noise \((fair|poor) above (\d+\.?\d*)\)/g))
        expect(Number(m[1])).toBeGreaterThan(Number(m[3]));
      expect(w.message).not.toMatch(/Point \d/);
    }
  });
});
