import { describe, expect, it } from 'vitest';
import { mount } from '@vue/test-utils';
import ModelsView from '../../../app/renderer/src/components/ModelsView.vue';
import { fixtureAnalysis } from '../../core/report/analysis-fixture';

// Tensile terms shown as shear terms are off by about three (E ≈ 3G for a rubber, docs/conventions.md §1):
// the Models view prints the deformation next to the Prony terms and uses its symbols.
describe('ModelsView', () => {
  it.each([
    ['shear', 'G(t) = Ge + Σ g_i exp(−t/τ_i)', 'E(t)'],
    ['tension', 'E(t) = Ee + Σ E_i exp(−t/τ_i)', 'G(t)'],
  ] as const)(
    'ModelsView of %s data shows the Prony series with its own symbols',
    (mode, formula, other) => {
      const w = mount(ModelsView, { props: { analysis: fixtureAnalysis('oscillatory', mode) } });
      const summary = w.find('[data-role="prony-summary"]').text();
      expect(summary).toContain(`Prony series in ${mode}`);
      expect(summary).toContain(formula);
      expect(w.text()).not.toContain(other);
      if (mode === 'tension') expect(summary).toMatch(/do not enter them as shear terms/);
    },
  );

  it('ModelsView says how each model was weighted and whether it converged', () => {
    const w = mount(ModelsView, { props: { analysis: fixtureAnalysis() } });
    expect(w.find('[data-role="model-fit-note"]').text()).toMatch(
      /^WLF: generalised least squares with the covariance of the shifts; converged\./,
    );
  });

  it('ModelsView gives the Prony series’ reduced window in the display frequency unit', () => {
    const a = fixtureAnalysis();
    const [lo] = a.prony!.reducedWindow;
    const hz = mount(ModelsView, {
      props: { analysis: a, units: { modulus: 'MPa', frequency: 'Hz' } },
    }).find('[data-role="prony-summary"]');
    expect(hz.text()).toMatch(/valid over the reduced window .* Hz at Tref/);
    expect(hz.text()).not.toContain('rad/s');
    // f = ω/2π (SI Brochure, BIPM 2019)
    const rad = mount(ModelsView, { props: { analysis: a } }).find('[data-role="prony-summary"]');
    expect(rad.text()).toMatch(/rad\/s at Tref/);
    const first = (t: string): number =>
      Number(
        /reduced window (\S+)/
          .exec(t)![1]
          .replace('×10', 'e')
          .replace(/[⁰¹²³⁴⁵⁶⁷⁸⁹⁻]/g, (c) =>
            String('⁰¹²³⁴⁵⁶⁷⁸⁹'.indexOf(c) >= 0 ? '⁰¹²³⁴⁵⁶⁷⁸⁹'.indexOf(c) : '-'),
          ),
      );
    expect(first(hz.text()) / first(rad.text())).toBeCloseTo(1 / (2 * Math.PI), 2);
    expect(lo).toBeGreaterThan(0);
  });
});
