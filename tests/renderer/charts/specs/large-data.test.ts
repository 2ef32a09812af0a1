import { beforeAll, describe, expect, it } from 'vitest';
import { masterPlot } from '../../../../app/renderer/src/charts/specs/master-plot';
import { measuredPlot } from '../../../../app/renderer/src/charts/specs/measured-plot';
import { DRAW_LIMIT } from '../../../../app/renderer/src/charts/specs/thin-series';
import { vgpPlot } from '../../../../app/renderer/src/charts/specs/vgp-plot';
import type { Analysis } from '../../../../core/pipeline/types';
import type { PlotSpec } from '../../../../app/renderer/src/charts/plot-spec';
import { millionPointAnalysis } from '../../../helpers/million-points';

const drawn = (p: PlotSpec): number =>
  p.series
    .filter((s) => s.style === 'disc' || s.style === 'ring')
    .reduce((n, s) => n + s.points.length, 0);

// Size (docs/conventions.md §7): 10⁶ points through the app's plot specs without a stack overflow; what is drawn is
// thinned to one point per grid cell, and the title says so.
describe('plot specs on 10⁶ points', () => {
  let a: Analysis;
  beforeAll(() => {
    a = millionPointAnalysis();
  }, 120_000);

  it('masterPlot(), measuredPlot() and vgpPlot() thin 10⁶ points to a drawable few and say so', () => {
    for (const p of [masterPlot(a), measuredPlot(a.dataset, {}), vgpPlot(a)!]) {
      expect(drawn(p), p.id).toBeLessThan(5 * DRAW_LIMIT);
      expect(drawn(p), p.id).toBeGreaterThan(1000);
      expect(p.title, p.id).toMatch(/showing [\d ]+ of [\d ]+ points/);
    }
    // the Prony lines are drawn in full
    const prony = masterPlot(a).series.filter((s) => s.id.startsWith('prony:'));
    expect(prony.map((s) => s.points.length)).toEqual([160, 160]);
  }, 120_000);
});
