import { describe, expect, it, vi } from 'vitest';
import { API_FUNCTIONS } from '../../app/preload/api';

const exposed: Record<string, unknown> = {};
const invoke = vi.fn(async (..._args: unknown[]) => ({ ok: true, value: null }));

vi.mock('electron', () => ({
  contextBridge: {
    exposeInMainWorld: (key: string, api: unknown) => {
      exposed[key] = api;
    },
  },
  ipcRenderer: { invoke, send: vi.fn(), on: vi.fn(), sendSync: vi.fn() },
}));

await import('../../app/preload/preload');

describe('preload', () => {
  it('preload exposes one object, window.thermoshift, with exactly the intended functions', () => {
    expect(Object.keys(exposed)).toEqual(['thermoshift']);
    const api = exposed.thermoshift as Record<string, unknown>;
    expect(Object.keys(api).sort()).toEqual([...API_FUNCTIONS].sort());
    for (const k of API_FUNCTIONS) expect(typeof api[k]).toBe('function');
    expect(api).not.toHaveProperty('ipcRenderer');
    expect(api).not.toHaveProperty('invoke');
    expect(api).not.toHaveProperty('send');
  });

  it('preload functions invoke their own channel with the given payload', async () => {
    const api = exposed.thermoshift as Record<string, (...a: unknown[]) => Promise<unknown>>;
    const calls: [string, unknown[], string, unknown][] = [
      ['openDataFiles', [], 'data-files:open', undefined],
      ['openDataFolder', [], 'data-folder:open', undefined],
      [
        'saveFile',
        [{ suggestedName: 'a.csv', content: 'x', encoding: 'utf8' }],
        'file:save',
        { suggestedName: 'a.csv', content: 'x', encoding: 'utf8' },
      ],
      ['openAnalysis', [], 'analysis:open', undefined],
      [
        'saveAnalysis',
        ['a.thermoshift.json', '{}'],
        'analysis:save',
        { suggestedName: 'a.thermoshift.json', text: '{}' },
      ],
      ['listRecent', [], 'recent:list', undefined],
      ['openRecent', ['abc-1'], 'recent:open', { id: 'abc-1' }],
      ['writeAutosave', ['{}'], 'autosave:write', { text: '{}' }],
      ['readAutosave', [], 'autosave:read', undefined],
    ];
    for (const [fn, args, channel, payload] of calls) {
      invoke.mockClear();
      await api[fn](...args);
      expect(invoke).toHaveBeenCalledWith(channel, payload);
    }
  });
});
