import { describe, expect, it } from 'vitest';
import { mount } from '@vue/test-utils';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import PredictionForm from '../../../app/renderer/src/components/PredictionForm.vue';
import { importFiles } from '../../../core/io';
import { buildMasterCurve } from '../../../core/pipeline';

const file = join(process.cwd(), 'samples', 'adhesive-relaxation', 'tf9-relaxation.tsv');
const analysis = buildMasterCurve(
  importFiles([{ name: 'tf9-relaxation.tsv', text: readFileSync(file, 'utf8') }]).dataset,
);

describe('PredictionForm', () => {
  it('PredictionForm offers time-domain quantities for relaxation data and answers with cautions', async () => {
    const w = mount(PredictionForm, { props: { analysis } });
    const options = w
      .findAll('[data-role="predict-quantity"] option')
      .map((o) => o.attributes('value'));
    expect(options).toEqual(['relaxation', 'creep']);
    await w.find('[data-role="predict-x"]').setValue('10');
    await w.find('form').trigger('submit');
    const answer = w.find('[data-role="prediction"]');
    expect(answer.exists()).toBe(true);
    expect(answer.text()).toMatch(/Pa/);
    expect(answer.text()).toMatch(/licensed engineering practice/);
  });

  it('PredictionForm explains a question it cannot answer', async () => {
    const w = mount(PredictionForm, { props: { analysis } });
    await w.find('[data-role="predict-temperature"]').setValue('hot');
    await w.find('form').trigger('submit');
    expect(w.text()).toMatch(/Enter a temperature in °C/);
    expect(w.find('[data-role="prediction"]').exists()).toBe(false);
  });
});
