import { describe, expect, it } from 'vitest';
import { keyMatcher } from '../../../app/renderer/src/composables/useKeyboardShortcuts';

const key = (k: string, o: Partial<KeyboardEventInit> = {}) =>
  new KeyboardEvent('keydown', { key: k, ...o });

describe('keyMatcher()', () => {
  it('keyMatcher() tells Ctrl+Z from Ctrl+Shift+Z and plain Z', () => {
    const undo = keyMatcher('Ctrl+Z');
    const redo = keyMatcher('Ctrl+Shift+Z');
    expect(undo(key('z', { ctrlKey: true }))).toBe(true);
    expect(undo(key('Z', { ctrlKey: true, shiftKey: true }))).toBe(false);
    expect(redo(key('Z', { ctrlKey: true, shiftKey: true }))).toBe(true);
    expect(undo(key('z'))).toBe(false);
    expect(keyMatcher('Ctrl+Z')(key('z', { metaKey: true }))).toBe(true);
  });

  it('keyMatcher() matches symbol and named keys whatever Shift is needed to type them', () => {
    expect(keyMatcher('?')(key('?', { shiftKey: true }))).toBe(true);
    expect(keyMatcher('F1')(key('F1'))).toBe(true);
    expect(keyMatcher('[')(key('['))).toBe(true);
  });
});
