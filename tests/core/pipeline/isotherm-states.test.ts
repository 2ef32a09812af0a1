import { describe, expect, it } from 'vitest';
import { isothermStates } from '../../../core/pipeline/isotherm-states';
import { wlfLog10aT } from '../../../core/models/shift-laws';
import type { Analysis } from '../../../core/pipeline/types';
import { fixtureAnalysis, FIXTURE_TRUTH } from '../report/analysis-fixture';
import { expectAbsClose } from '../../helpers/assert-close';

/** The fixture with T02 left out by the engine (no shift) and T05 locked. */
function withEngineDrop(): Analysis {
  const a = fixtureAnalysis();
  return {
    ...a,
    settings: { ...a.settings, lockedLog10aT: { T05: -1.5 } },
    curves: a.curves.map((c) =>
      c.isothermId === 'T02'
        ? {
            ...c,
            included: false,
            log10aT: null,
            log10aTStdErr: null,
            note: 'overlaps no other isotherm: no shift can be found; 3 outlier point(s) left out',
            // The reason comes from the structured field, not from the note's text.
            leftOut: {
              code: 'no-overlap' as const,
              message: 'overlaps no other isotherm: no shift can be found',
            },
          }
        : c,
    ),
  };
}

describe('isothermStates()', () => {
  it('isothermStates() tells used, excluded by the user, left out by the engine (with why) and locked apart', () => {
    const s = new Map(isothermStates(withEngineDrop()).map((x) => [x.isothermId, x]));
    expect(s.get('T01')!.use).toBe('used');
    expect(s.get('T07')!.use).toBe('excluded');
    expect(s.get('T07')!.description).toMatch(/Excluded by you/);
    expect(s.get('T02')!.use).toBe('left-out');
    expect(s.get('T02')!.reason).toBe('overlaps no other isotherm: no shift can be found');
    expect(s.get('T02')!.description).toMatch(/Left out by the shift engine: overlaps no other/);
    expect(s.get('T05')!.locked).toBe(true);
    expect(s.get('T01')!.locked).toBe(false);
  });

  it('isothermStates() draws an isotherm without a shift at the fitted model’s shift for its temperature', () => {
    const a = withEngineDrop();
    const t2 = isothermStates(a).find((x) => x.isothermId === 'T02')!;
    expect(t2.placedBy).toBe('wlf');
    // WLF: log10 aT = −C1 (T − Tr)/(C2 + T − Tr) (Williams, Landel & Ferry, JACS 77, 1955)
    const T = a.curves.find((c) => c.isothermId === 'T02')!.temperatureK;
    expectAbsClose(
      t2.drawLog10aT!,
      wlfLog10aT(T, FIXTURE_TRUTH.c1, FIXTURE_TRUTH.c2K, FIXTURE_TRUTH.referenceK),
      1e-12,
      'log10 aT of the placement',
    );
    const t7 = isothermStates(a).find((x) => x.isothermId === 'T07')!;
    expect(t7.placedBy).toBe('fit'); // the excluded isotherm kept the shift it had
  });

  it('isothermStates() places the isotherm at Tref at log10 aT = 0 and leaves one it cannot place unplaced', () => {
    const a = withEngineDrop();
    const atRef = {
      ...a,
      models: {},
      curves: a.curves.map((c) =>
        c.isothermId === 'T04' || c.isothermId === 'T02'
          ? { ...c, included: false, log10aT: null, note: 'overlaps no other isotherm' }
          : c,
      ),
    };
    const s = new Map(isothermStates(atRef).map((x) => [x.isothermId, x]));
    expect(s.get('T04')!.drawLog10aT).toBe(0); // T04 is at Tref = 100 °C
    expect(s.get('T04')!.placedBy).toBe('reference');
    expect(s.get('T02')!.drawLog10aT).toBeNull();
    expect(s.get('T02')!.description).toMatch(/cannot show it/);
  });
});
