import { describe, it, expect } from 'vitest';
import { WarningSink } from '../../../core/io/warning-sink';

describe('WarningSink', () => {
  it('WarningSink lists up to max warnings and sums up the rest in one closing warning', () => {
    const sink = new WarningSink('a.csv', 2);
    sink.add(3, 1, 'one');
    sink.add(4, 2, 'two');
    sink.add(5, 3, 'three');
    sink.addUnlisted(4);
    const list = sink.finish();
    expect(list.slice(0, 2)).toEqual([
      { file: 'a.csv', row: 3, column: 1, message: 'one' },
      { file: 'a.csv', row: 4, column: 2, message: 'two' },
    ]);
    expect(list[2]).toEqual({
      file: 'a.csv',
      row: 0,
      column: 0,
      message: expect.stringMatching(/^5 more/),
    });
  });

  it('WarningSink adds no summary when everything was listed', () => {
    const sink = new WarningSink('a.csv', 5);
    sink.add(1, 1, 'x');
    expect(sink.finish()).toHaveLength(1);
  });
});
