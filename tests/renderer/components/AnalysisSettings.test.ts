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

  it('AnalysisSettings asks for density inputs when bT comes from density', async () => {
    const w = make();
    await w.find('[data-role="vertical"]').setValue('density');
    const patch = w.emitted('change')![0][0] as { verticalShift: string; density: object };
    expect(patch.verticalShift).toBe('density');
    expect(patch.density).toEqual({ referenceDensityKgPerM3: 900, volumetricExpansionPerK: 6e-4 });
    const w2 = make({ verticalShift: 'data' });
    expect(w2.text()).toMatch(/weakens the meaning of both/);
  });
});
