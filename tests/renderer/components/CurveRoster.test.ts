import { describe, expect, it } from 'vitest';
import { mount } from '@vue/test-utils';
import CurveRoster from '../../../app/renderer/src/components/CurveRoster.vue';
import type { AnalysisCurve } from '../../../core/pipeline/types';
import { tinyDataset } from '../document/tiny-dataset';

const curves: AnalysisCurve[] = [
  {
    isothermId: 'T01',
    temperatureK: 300,
    log10aT: 0,
    log10aTStdErr: 0,
    log10bT: 0,
    log10bTStdErr: 0,
    included: true,
    qualityRmsDecades: 0.01,
  },
  {
    isothermId: 'T02',
    temperatureK: 320,
    log10aT: -1.23456,
    log10aTStdErr: 0.0123,
    log10bT: 0,
    log10bTStdErr: 0,
    included: true,
    qualityRmsDecades: 0.02,
  },
];

function make(extra: Record<string, unknown> = {}) {
  return mount(CurveRoster, {
    props: {
      isotherms: tinyDataset().isotherms,
      curves,
      excluded: [],
      locked: { T02: -1.23456 },
      selectedId: null,
      colour: () => '#123456',
      nudgeStep: 0.05,
      ...extra,
    },
  });
}

describe('CurveRoster', () => {
  it('CurveRoster shows each isotherm in °C with its shift in decades and its lock state', () => {
    const w = make();
    const rows = w.findAll('tr[data-isotherm]');
    expect(rows).toHaveLength(2);
    expect(rows[0].text()).toContain('26.9');
    expect(rows[1].find('[data-role="log-aT"]').text()).toBe('-1.235');
    expect(rows[1].find('[data-role="lock"]').attributes('aria-pressed')).toBe('true');
    expect(rows[0].find('[data-role="lock"]').attributes('aria-pressed')).toBe('false');
  });

  it('CurveRoster emits include, lock and nudge edits for the row clicked', async () => {
    const w = make();
    const row = w.find('tr[data-isotherm="T01"]');
    await row.find('[data-role="include"]').trigger('change');
    await row.find('[data-role="lock"]').trigger('click');
    await row.find('[data-role="nudge-left"]').trigger('click');
    await row.find('[data-role="nudge-right"]').trigger('click');
    expect(w.emitted('toggleInclude')).toEqual([['T01']]);
    expect(w.emitted('toggleLock')).toEqual([['T01']]);
    expect(w.emitted('nudge')).toEqual([
      ['T01', -0.05],
      ['T01', 0.05],
    ]);
    expect(w.emitted('select')).toBeUndefined();
  });

  it('CurveRoster greys out excluded isotherms and disables their nudging', () => {
    const w = make({ excluded: ['T02'] });
    const row = w.find('tr[data-isotherm="T02"]');
    expect(row.classes()).toContain('off');
    expect((row.find('[data-role="include"]').element as HTMLInputElement).checked).toBe(false);
    expect(row.find('[data-role="nudge-right"]').attributes('disabled')).toBeDefined();
  });

  it('CurveRoster shows an isotherm the engine left out with no ticked box, a mark and the reason', () => {
    const w = make({
      states: [
        {
          isothermId: 'T02',
          temperatureK: 320,
          use: 'left-out',
          locked: false,
          reason: 'overlaps no other isotherm: no shift can be found',
          description:
            'Left out by the shift engine: overlaps no other isotherm: no shift can be found.',
          drawLog10aT: null,
          drawLog10bT: 0,
          placedBy: null,
        },
      ],
    });
    const row = w.find('tr[data-isotherm="T02"]');
    const box = row.find('[data-role="include"]').element as HTMLInputElement;
    expect(box.checked).toBe(false);
    expect(box.indeterminate).toBe(true);
    expect(row.attributes('data-state')).toBe('left-out');
    expect(row.find('[data-role="left-out"]').attributes('title')).toMatch(/overlaps no other/);
    expect(row.attributes('title')).toMatch(/Left out by the shift engine/);
  });
});
