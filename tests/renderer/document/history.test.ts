import { describe, expect, it } from 'vitest';
import {
  createHistory,
  pushHistory,
  redo,
  replacePresent,
  undo,
} from '../../../app/renderer/src/document/history';

describe('pushHistory()', () => {
  it('pushHistory() records the old present and clears the redo list', () => {
    let h = pushHistory(pushHistory(createHistory('a'), 'b'), 'c');
    h = undo(h);
    expect(h.present).toBe('b');
    h = pushHistory(h, 'd');
    expect(h.past).toEqual(['a', 'b']);
    expect(h.future).toEqual([]);
  });

  it('pushHistory() keeps at most `limit` undo steps', () => {
    let h = createHistory(0);
    for (let i = 1; i <= 10; i++) h = pushHistory(h, i, 3);
    expect(h.past).toEqual([7, 8, 9]);
  });

  it('pushHistory() ignores pushing the present itself', () => {
    const h = createHistory('a');
    expect(pushHistory(h, 'a')).toBe(h);
  });
});

describe('undo() and redo()', () => {
  it('undo() and redo() walk back and forth and stop at the ends', () => {
    let h = pushHistory(pushHistory(createHistory(1), 2), 3);
    h = undo(undo(undo(h)));
    expect(h.present).toBe(1);
    h = redo(redo(redo(h)));
    expect(h.present).toBe(3);
    expect(h.future).toEqual([]);
  });
});

describe('replacePresent()', () => {
  it('replacePresent() changes the present without an undo step', () => {
    const h = replacePresent(pushHistory(createHistory('a'), 'b'), 'b2');
    expect(h.past).toEqual(['a']);
    expect(undo(h).present).toBe('a');
  });
});
