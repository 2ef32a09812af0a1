import { beforeEach, describe, expect, it, vi } from 'vitest';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { IpcMainInvokeEvent } from 'electron';
import type { IpcMainLike } from '../../app/main/ipc';
import { writeWorkbook } from '../../core/synthetic';

const dialog = { showOpenDialog: vi.fn(), showSaveDialog: vi.fn() };
vi.mock('electron', () => ({ dialog }));
const { setupFiles } = await import('../../app/main/setup-files');
const { setupAutosave } = await import('../../app/main/setup-autosave');
const { createRecentStore } = await import('../../app/main/recent-files');

const dir = mkdtempSync(join(tmpdir(), 'ts-files-'));
writeFileSync(join(dir, 'melt_150C.csv'), 'T,f\n150,1\n');
writeFileSync(join(dir, 'melt_160C.csv'), 'T,f\n160,1\n');

function harness() {
  const handlers = new Map<string, (e: IpcMainInvokeEvent, p: unknown) => Promise<unknown>>();
  const ipcMain: IpcMainLike = { handle: (c, fn) => void handlers.set(c, fn) };
  const recent = createRecentStore(join(mkdtempSync(join(tmpdir(), 'ts-rec-')), 'recent.json'));
  const win = {} as Electron.BrowserWindow;
  const opts = { ipcMain, isTrusted: () => true, log: () => undefined };
  setupFiles({ ...opts, getWindow: () => win, recent });
  setupAutosave(join(dir, 'autosave.json'), opts);
  const call = (c: string, p?: unknown) => handlers.get(c)!({} as IpcMainInvokeEvent, p);
  return { call, recent, win };
}

beforeEach(() => {
  dialog.showOpenDialog.mockReset();
  dialog.showSaveDialog.mockReset();
});

describe('setupFiles()', () => {
  it('setupFiles() opens the files the user picked, as names and text, and lists them under Recent once they opened', async () => {
    const h = harness();
    dialog.showOpenDialog.mockResolvedValue({
      canceled: false,
      filePaths: [join(dir, 'melt_150C.csv'), join(dir, 'melt_160C.csv')],
    });
    const r = (await h.call('data-files:open')) as {
      ok: true;
      value: { name: string; text: string }[];
    };
    expect(r.ok).toBe(true);
    expect(r.value).toEqual([
      { name: 'melt_150C.csv', text: 'T,f\n150,1\n' },
      { name: 'melt_160C.csv', text: 'T,f\n160,1\n' },
    ]);
    expect(dialog.showOpenDialog.mock.calls[0][0]).toBe(h.win);
    // listed under Recent only once the renderer says the files opened
    expect(((await h.call('recent:list')) as { value: unknown[] }).value).toEqual([]);
    expect(await h.call('recent:confirm', { kind: 'data' })).toEqual({ ok: true, value: true });
    const recent = (await h.call('recent:list')) as { value: { id: string; label: string }[] };
    expect(recent.value[0].label).toBe('melt_150C.csv + 1 more');
    const again = (await h.call('recent:open', { id: recent.value[0].id })) as {
      value: { kind: string; files: unknown[] };
    };
    expect(again.value.kind).toBe('data');
    expect(again.value.files).toHaveLength(2);
  });

  it('setupFiles() returns nothing when a dialog is cancelled', async () => {
    const h = harness();
    dialog.showOpenDialog.mockResolvedValue({ canceled: true, filePaths: [] });
    dialog.showSaveDialog.mockResolvedValue({ canceled: true });
    expect(await h.call('data-files:open')).toEqual({ ok: true, value: [] });
    expect(await h.call('analysis:open')).toEqual({ ok: true, value: null });
    expect(
      await h.call('file:save', { suggestedName: 'a.csv', content: 'x', encoding: 'utf8' }),
    ).toEqual({ ok: true, value: null });
  });

  it('setupFiles() writes exports where the save dialog says, text or base64 images', async () => {
    const h = harness();
    const target = join(dir, 'chosen.png');
    dialog.showSaveDialog.mockResolvedValue({ canceled: false, filePath: target });
    const png = Buffer.from([0x89, 0x50, 0x4e, 0x47]).toString('base64');
    const r = await h.call('file:save', {
      suggestedName: 'plot.png',
      content: png,
      encoding: 'base64',
    });
    expect(r).toEqual({ ok: true, value: { name: 'chosen.png' } });
    expect(readFileSync(target).subarray(1, 4).toString()).toBe('PNG');
    expect(dialog.showSaveDialog.mock.calls[0][1].defaultPath).toBe('plot.png');
  });

  it('setupFiles() reports a file that cannot be read as a message, not a crash', async () => {
    const h = harness();
    dialog.showOpenDialog.mockResolvedValue({
      canceled: false,
      filePaths: [join(dir, 'missing.csv')],
    });
    const r = (await h.call('data-files:open')) as { ok: boolean; message: string };
    expect(r.ok).toBe(false);
    expect(r.message).toMatch(/missing\.csv/);
  });
});

describe('setupFiles() folders and workbooks', () => {
  const folder = mkdtempSync(join(tmpdir(), 'ts-folder-'));
  writeFileSync(join(folder, 'pad_10C.csv'), 'f,E\n1,2\n');
  writeFileSync(join(folder, 'pad_2C.csv'), 'f,E\n1,3\n');
  writeFileSync(join(folder, 'README.md'), 'notes');
  writeFileSync(join(folder, '.hidden.csv'), 'x');
  writeFileSync(
    join(folder, 'pad.xlsx'),
    writeWorkbook([
      {
        name: '40 °C',
        rows: [
          ['f', 'E'],
          [1, 4],
        ],
      },
      {
        name: '60 °C',
        rows: [
          ['f', 'E'],
          [1, 5],
        ],
      },
    ]),
  );

  it('setupFiles() opens a chosen folder: its data files by name, a workbook as its sheets', async () => {
    const h = harness();
    dialog.showOpenDialog.mockResolvedValue({ canceled: false, filePaths: [folder] });
    const r = (await h.call('data-folder:open')) as {
      ok: true;
      value: { name: string; text: string }[];
    };
    expect(r.ok).toBe(true);
    expect(r.value.map((f) => f.name)).toEqual([
      'pad_2C.csv',
      'pad_10C.csv',
      'pad.xlsx › 40 °C',
      'pad.xlsx › 60 °C',
    ]);
    expect(r.value[2].text).toBe('f\tE\n1\t4');
    expect(dialog.showOpenDialog.mock.calls[0][1].properties).toEqual(['openDirectory']);
    // The folder's files, not the folder, are remembered once they opened.
    await h.call('recent:confirm', { kind: 'data' });
    const recent = (await h.call('recent:list')) as { value: { id: string; label: string }[] };
    const again = (await h.call('recent:open', { id: recent.value[0].id })) as {
      value: { files: { name: string }[] };
    };
    expect(again.value.files.map((f) => f.name)).toEqual(r.value.map((f) => f.name));
  });

  it('setupFiles() says so when a chosen folder holds no data files', async () => {
    const h = harness();
    const empty = mkdtempSync(join(tmpdir(), 'ts-empty-'));
    writeFileSync(join(empty, 'notes.md'), 'x');
    dialog.showOpenDialog.mockResolvedValue({ canceled: false, filePaths: [empty] });
    const r = (await h.call('data-folder:open')) as { ok: boolean; message: string };
    expect(r.ok).toBe(false);
    expect(r.message).toMatch(/holds no data files/);
  });

  it('setupFiles() opens a picked workbook as its sheets', async () => {
    const h = harness();
    dialog.showOpenDialog.mockResolvedValue({
      canceled: false,
      filePaths: [join(folder, 'pad.xlsx')],
    });
    const r = (await h.call('data-files:open')) as { value: { name: string }[] };
    expect(r.value.map((f) => f.name)).toEqual(['pad.xlsx › 40 °C', 'pad.xlsx › 60 °C']);
  });
});

describe('setupAutosave()', () => {
  it('setupAutosave() keeps the last text written and reads it back', async () => {
    const h = harness();
    expect(await h.call('autosave:write', { text: '{"a":1}' })).toEqual({ ok: true, value: true });
    expect(await h.call('autosave:read')).toEqual({ ok: true, value: '{"a":1}' });
  });
});
