import { describe, expect, it, vi } from 'vitest';
import { createApi } from '../../../app/preload/api';
import { desktopAccess } from '../../../app/renderer/src/platform/desktop-access';

describe('desktopAccess()', () => {
  it('desktopAccess() passes values through and turns a refusal into an error with its message', async () => {
    const invoke = vi.fn(async (channel: string) =>
      channel === 'file:save'
        ? { ok: true, value: { name: 'out.csv' } }
        : channel === 'analysis:open'
          ? { ok: true, value: null }
          : channel === 'recent:confirm'
            ? { ok: true, value: true }
            : { ok: false, message: 'The disk is full.' },
    );
    const access = desktopAccess(createApi(invoke as never));
    expect(access.kind).toBe('desktop');
    expect(await access.saveFile({ suggestedName: 'a.csv', content: 'x', encoding: 'utf8' })).toBe(
      'out.csv',
    );
    expect(await access.openAnalysis()).toBeNull();
    await expect(access.writeAutosave('{}')).rejects.toThrow('The disk is full.');
    await access.rememberRecent('data', [{ name: 'a', text: 'b' }], false);
    expect(invoke).toHaveBeenCalledTimes(3); // remembering dropped files needs no call: main never sees their paths
    await access.rememberRecent('data', [{ name: 'a', text: 'b' }], true);
    expect(invoke).toHaveBeenLastCalledWith('recent:confirm', { kind: 'data' });
  });
});
