import { describe, expect, it } from 'vitest';
import { fittedWindow } from '../../../app/renderer/src/charts/chart-config';
import { newDocument } from '../../../app/renderer/src/document/analysis-document';
import {
  availableViews,
  VIEW_GROUPS,
  type ViewContext,
} from '../../../app/renderer/src/views/view-catalogue';
import { isothermStates } from '../../../core/pipeline/isotherm-states';
import { toCelsius } from '../../../core/pipeline/temperature';
import { fixtureAnalysis } from '../../core/report/analysis-fixture';

const a = fixtureAnalysis();
const ctx: ViewContext = {
  doc: newDocument(a.dataset, 'fixture'),
  analysis: a,
  units: { modulus: 'MPa', frequency: 'Hz' },
  states: isothermStates(a),
};

describe('VIEW_GROUPS', () => {
  it('VIEW_GROUPS keeps the tabs few (six) and every plot view builds a plot with a unique id', () => {
    expect(VIEW_GROUPS).toHaveLength(6);
    const ids = VIEW_GROUPS.flatMap((g) => availableViews(g, ctx))
      .filter((v) => v.kind === 'plot')
      .map((v) => v.plot!(ctx)!.id);
    expect(new Set(ids).size).toBe(ids.length);
    expect(ids).toEqual(
      expect.arrayContaining(['master-tan-delta', 'arrhenius', 'cole-cole', 'spectrum']),
    );
  });

  it('every plot draws left-out isotherms faded (never hidden) and in the display units', () => {
    for (const v of VIEW_GROUPS.flatMap((g) => availableViews(g, ctx))) {
      const spec = v.plot?.(ctx);
      if (!spec) continue;
      const t07 = spec.series.filter((s) => s.isothermId === 'T07');
      if (['model-residuals', 'spectrum', 'master-relaxation'].includes(spec.id)) continue;
      expect(t07.length, `${spec.id} shows the excluded T07`).toBeGreaterThan(0);
      for (const s of t07) expect(s.faint, `${spec.id} fades T07`).toBe(true);
      if (/\(.*Pa\)/.test(spec.y.label)) expect(spec.y.label, spec.id).toMatch(/MPa/);
    }
  });

  it('the shift plot has a Tg line when Tg is known', () => {
    const withTg = { ...a, settings: { ...a.settings, glassTransitionK: 330 } };
    const spec = VIEW_GROUPS[2].views[0].plot!({ ...ctx, analysis: withTg })!;
    const tg = spec.series.find((s) => s.id === 'tg')!;
    expect(tg.points.map((p) => p.x)).toEqual([toCelsius(330), toCelsius(330)]);
  });
});

describe('fittedWindow()', () => {
  it('fittedWindow() leaves a margin round the data so edge markers are drawn whole', () => {
    const spec = VIEW_GROUPS[1].views[0].plot!(ctx)!;
    const w = fittedWindow(spec)!;
    const xs = spec.series.flatMap((s) => s.points.map((p) => p.x));
    expect(w.xMin).toBeLessThan(Math.min(...xs));
    expect(w.xMax).toBeGreaterThan(Math.max(...xs));
    // 4 % of the decades on each side
    const span = Math.log10(Math.max(...xs)) - Math.log10(Math.min(...xs));
    expect(Math.log10(Math.min(...xs)) - Math.log10(w.xMin)).toBeCloseTo(
      Math.max(0.04 * span, 0.05),
      9,
    );
  });
});
