import { describe, expect, it } from 'vitest';
import { logSpace } from '../../../core/spectrum/log-grid';
import { expectRelClose } from '../../helpers/assert-close';

describe('logSpace()', () => {
  it('logSpace() spans min … max with the requested density', () => {
    const g = logSpace(0.1, 1000, 5);
    expect(g).toHaveLength(21);
    expectRelClose(g[0], 0.1, 1e-12);
    expectRelClose(g[20], 1000, 1e-12);
    expect(logSpace(1, 1.5, 1)).toHaveLength(2);
    expect(() => logSpace(0, 1, 5)).toThrow(/0 < min < max/);
  });
});
