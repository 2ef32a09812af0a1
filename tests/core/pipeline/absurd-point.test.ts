/**
 * One absurd frequency cell (an invented melt, seeded) must neither stretch the Prony grid over
 * hundreds of decades nor move the shifts: the grid covers only where the master curve has data
 * (its densest run of points per decade).
 */
import { describe, expect, it } from 'vitest';
import { buildMasterCurve } from '../../../core/pipeline';
import { syntheticIsotherms } from '../../../core/synthetic';
import { MELT_ARRHENIUS } from '../shift/fixtures';
import { expectAbsClose } from '../../helpers/assert-close';

describe('buildMasterCurve() with one absurd frequency', () => {
  for (const absurd of [1e-100, 1e-300])
    it(`buildMasterCurve() keeps the Prony grid on the data with one point at ω = ${absurd} rad/s`, () => {
      const { dataset } = syntheticIsotherms({
        ...MELT_ARRHENIUS.options,
        relativeNoise: 0.02,
        seed: 9,
      });
      const clean = buildMasterCurve(dataset, { referenceTemperatureK: 463.15 });
      const iso = dataset.isotherms[3];
      iso.x = [absurd, ...iso.x.slice(1)];
      const a = buildMasterCurve(dataset, { referenceTemperatureK: 463.15 });
      const tau = a.prony!.tauS;
      const span = Math.log10(Math.max(...tau) / Math.min(...tau));
      const cleanTau = clean.prony!.tauS;
      const cleanSpan = Math.log10(Math.max(...cleanTau) / Math.min(...cleanTau));
      // The measured reduced window spans about 10 decades; one stray point adds nothing.
      expect(span).toBeLessThan(cleanSpan + 1);
      a.curves.forEach((c, k) =>
        expectAbsClose(c.log10aT!, clean.curves[k].log10aT!, 0.02, c.isothermId),
      );
    });
});
