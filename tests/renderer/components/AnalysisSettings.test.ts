import { describe, expect, it } from 'vitest';
import { mount } from '@vue/test-utils';
import AnalysisSettings from '../../../app/renderer/src/components/AnalysisSettings.vue';
import { tinyDataset } from '../document/tiny-dataset';
import { expectAbsClose } from '../../helpers/assert-close';

const make = (options = {}) =>
  mount(AnalysisSettings, { props: { dataset: tinyDataset(), options, usedReferenceK: 300 } });

describe('AnalysisSettings', () => {
  it('AnalysisSettings shows the reference temperature in use, in °C', () => {
    expect((make().find('[data-role="tref"]').element as HTMLInputElement).value).toBe('26.9');
  });

  it('AnalysisSettings emits Tref in kelvin from °C typed with a decimal comma', async () => {
    const w = make();
    const input = w.find('[data-role="tref"]');
    await input.setValue('40,5');
    await input.trigger('change');
    const patch = w.emitted('change')![0][0] as { referenceTemperatureK: number };
    // 40.5 °C + 273.15 K; 1e-9 K allows for floating-point rounding only
    expectAbsClose(patch.referenceTemperatureK, 313.65, 1e-9, 'Tref in K');
  });

  it('AnalysisSettings offers the quantities present and emits the driver choice', async () => {
    const w = make();
    const labels = w.findAll('[data-role="drivers"] option').map((o) => o.text());
    expect(labels).toContain("G' and G''");
    await w.find('[data-role="drivers"]').setValue('storageModulus,lossModulus');
    expect(w.emitted('change')![0][0]).toEqual({
      shiftQuantities: ['storageModulus', 'lossModulus'],
    });
  });

  it('AnalysisSettings offers αV as a typical value, not as if measured, and leaves ρ empty', async () => {
    const w = make();
    expect((w.find('[data-role="vertical"]').element as HTMLSelectElement).value).toBe('auto');
    await w.find('[data-role="vertical"]').setValue('density');
    const patch = w.emitted('change')![0][0] as { verticalShift: string; density: object };
    expect(patch.verticalShift).toBe('density');
    // bT needs αV alone: no density is filled in for the user.
    expect(patch.density).toEqual({ volumetricExpansionPerK: 6e-4 });
    const w1 = make({ verticalShift: 'density', density: { volumetricExpansionPerK: 6e-4 } });
    expect(w1.find('[data-role="typical"]').text()).toMatch(/typical value.*not a measurement/);
    const rho = w1.findAll('input[type="number"]')[0].element as HTMLInputElement;
    expect(rho.value).toBe('');
    const w2 = make({ verticalShift: 'density', density: { volumetricExpansionPerK: 7.1e-4 } });
    expect(w2.find('[data-role="typical"]').exists()).toBe(false);
  });

  it('AnalysisSettings shows which vertical shift the analysis applied and why', () => {
    const w = mount(AnalysisSettings, {
      props: {
        dataset: tinyDataset(),
        options: {},
        usedReferenceK: 300,
        verticalChoice: { chosen: 'data', reason: 'bT from the data: the mismatch drops' },
      },
    });
    expect(w.find('[data-role="vertical-reason"]').text()).toMatch(/data — bT from the data/);
  });
});
