/**
 * The app's model views read the shift-model registry: a toy model added through
 * `registerShiftModel` alone (tests/core/models/registry/linear-toy-model.ts) appears in the
 * shift-factor and residual plots, the models table, the fit notes and the prediction form.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mount } from '@vue/test-utils';
import { registerShiftModel } from '../../../core/models';
import { buildMasterCurve } from '../../../core/pipeline';
import { meltProny, syntheticIsotherms } from '../../../core/synthetic';
import ModelsView from '../../../app/renderer/src/components/ModelsView.vue';
import PredictionForm from '../../../app/renderer/src/components/PredictionForm.vue';
import { shiftPlot } from '../../../app/renderer/src/charts/specs/shift-plot';
import { modelResidualsPlot } from '../../../app/renderer/src/charts/specs/model-residuals-plot';
import { modelTable } from '../../../app/renderer/src/tables/analysis-tables';
import { linearToyModel } from '../../core/models/registry/linear-toy-model';

describe('the app with a registered toy model', () => {
  let remove: () => void = () => undefined;
  beforeAll(() => {
    remove = registerShiftModel(linearToyModel);
  });
  afterAll(() => remove());

  const analysis = () => {
    const { dataset } = syntheticIsotherms({
      seed: 5,
      testKind: 'oscillatory',
      deformation: 'shear',
      components: [
        {
          prony: meltProny({ plateauModulusPa: 2e5, peakTauS: 0.1, widthDecades: 1.2 }),
          law: { kind: 'arrhenius', activationEnergyJPerMol: 45e3 },
        },
      ],
      xMin: 0.1,
      xMax: 100,
      pointsPerDecade: 4,
      temperaturesK: [423.15, 443.15, 463.15, 483.15],
      referenceK: 443.15,
      relativeNoise: 0.02,
    });
    return buildMasterCurve(dataset, { pronyModesPerDecade: 1, models: ['arrhenius', 'linear'] });
  };

  it('shiftPlot(), modelResidualsPlot() and modelTable() show the toy model from its descriptor', () => {
    const a = analysis();
    const line = shiftPlot(a).series.find((s) => s.id === 'model:linear');
    expect(line).toMatchObject({ label: 'linear', colour: '#2f6f3e', style: 'dashed' });
    const res = modelResidualsPlot(a).series.find((s) => s.id === 'residuals:linear');
    expect(res).toMatchObject({ colour: '#2f6f3e', style: 'ring' });
    const rows = modelTable(a).rows.filter((r) => r[0] === 'linear');
    expect(rows).toHaveLength(1);
    expect(rows[0][1]).toBe('b');
    expect(rows[0][6]).toBe('1/K');
  });

  it('ModelsView and PredictionForm list the toy model by its names', () => {
    const a = analysis();
    const notes = mount(ModelsView, { props: { analysis: a } })
      .findAll('[data-role="model-fit-note"]')
      .map((n) => n.text());
    expect(notes.some((n) => n.startsWith('Linear: '))).toBe(true);
    const options = mount(PredictionForm, { props: { analysis: a } })
      .findAll('option')
      .map((o) => o.text());
    expect(options).toContain('linear');
    expect(options).toContain('Arrhenius');
  });
});
