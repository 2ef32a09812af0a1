import { describe, expect, it } from 'vitest';
import { INVENTED_DEMO_MARKER, isInventedDemo } from '../../../core/synthetic/demo-header';

describe('isInventedDemo()', () => {
  it('isInventedDemo() is true for the generator’s own marker only, not for the word anywhere', () => {
    expect(isInventedDemo({ note: `${INVENTED_DEMO_MARKER} (scenario seal-dma)` })).toBe(true);
    expect(isInventedDemo({ invented: 'yes' })).toBe(true);
    expect(isInventedDemo({ note: 'compound invented in our lab in 1998' })).toBe(false);
    expect(isInventedDemo({ sample: 'QS-72 (invented)' })).toBe(false);
    expect(isInventedDemo({})).toBe(false);
  });
});
