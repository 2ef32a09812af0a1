import { describe, it, expect } from 'vitest';
import { findBlocks } from '../../../core/io/blocks';

describe('findBlocks()', () => {
  const header = ['f (Hz)', "G' (Pa)"];
  it('findBlocks() finds temperature lines and the rows they open', () => {
    const plan = findBlocks(
      [
        { row: 3, line: 7, text: '# Temperature: 60 °C', comment: true },
        { row: 3, line: 8, text: "f (Hz),G' (Pa)", comment: false },
        { row: 6, line: 12, text: 'T = 353.15 K', comment: false },
      ],
      header,
      'comma',
    );
    expect(plan.starts).toEqual([
      { row: 3, line: 7, temperatureK: 333.15 },
      { row: 6, line: 12, temperatureK: 353.15 },
    ]);
    expect([...plan.quietRows]).toEqual([3, 6]);
  });

  it('findBlocks() keeps other text rows as problems', () => {
    const plan = findBlocks(
      [{ row: 2, line: 4, text: 'pump stopped,1', comment: false }],
      header,
      'comma',
    );
    expect(plan.starts).toEqual([]);
    expect(plan.quietRows.size).toBe(0);
  });

  it('findBlocks() drops repeated units rows quietly', () => {
    const plan = findBlocks([{ row: 5, line: 9, text: 'Hz,Pa', comment: false }], header, 'comma');
    expect([...plan.quietRows]).toEqual([5]);
  });
});
