import { describe, expect, it } from 'vitest';
import { AUTOSAVE_KEY, browserAccess } from '../../../app/renderer/src/platform/browser-access';
import { memoryStore } from '../../../app/renderer/src/platform/idb-store';

function fakeStorage(limitChars = Number.POSITIVE_INFINITY): Storage {
  const m = new Map<string, string>();
  return {
    get length() {
      return m.size;
    },
    clear: () => m.clear(),
    key: (i: number) => [...m.keys()][i] ?? null,
    getItem: (k: string) => m.get(k) ?? null,
    removeItem: (k: string) => void m.delete(k),
    setItem: (k: string, v: string) => {
      if (v.length > limitChars) throw new DOMException('quota', 'QuotaExceededError');
      m.set(k, v);
    },
  };
}

describe('browserAccess()', () => {
  it('browserAccess() remembers recent files with their text and reopens them by id', async () => {
    const a = browserAccess(memoryStore(), fakeStorage());
    await a.rememberRecent(
      'data',
      [
        { name: 'a_40C.csv', text: '1' },
        { name: 'a_60C.csv', text: '2' },
      ],
      true,
    );
    await a.rememberRecent('analysis', [{ name: 'b.thermoshift.json', text: '{}' }], false);
    const list = await a.listRecent();
    expect(list.map((e) => e.label)).toEqual(['b.thermoshift.json', 'a_40C.csv + 1 more']);
    expect(list[0]).not.toHaveProperty('files');
    const again = await a.openRecent(list[1].id);
    expect(again).toEqual({
      kind: 'data',
      files: [
        { name: 'a_40C.csv', text: '1' },
        { name: 'a_60C.csv', text: '2' },
      ],
    });
    await expect(a.openRecent('gone')).rejects.toThrow(/no longer in the list/);
  });

  it('browserAccess() autosaves to localStorage, and to IndexedDB when localStorage is full', async () => {
    const storage = fakeStorage(10);
    const a = browserAccess(memoryStore(), storage);
    await a.writeAutosave('small');
    expect(storage.getItem(AUTOSAVE_KEY)).toBe('small');
    expect(await a.readAutosave()).toBe('small');
    await a.writeAutosave('a much larger analysis');
    expect(storage.getItem(AUTOSAVE_KEY)).toBeNull();
    expect(await a.readAutosave()).toBe('a much larger analysis');
    await a.writeAutosave('tiny');
    expect(await a.readAutosave()).toBe('tiny');
  });
});
