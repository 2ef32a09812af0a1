import { describe, expect, it } from 'vitest';
import { effectScope } from 'vue';
import { droppedFiles, useFileDrop } from '../../../app/renderer/src/composables/useFileDrop';
import type { TextFile } from '../../../app/renderer/src/platform/file-access';

/** A dropped file or folder as the browser's FileSystemEntry API hands it out. */
function fileEntry(name: string, text = `${name} text`): FileSystemFileEntry {
  return {
    isFile: true,
    isDirectory: false,
    name,
    file: (ok: (f: File) => void) => ok(new File([text], name)),
  } as unknown as FileSystemFileEntry;
}

/** A folder whose entries come in batches, as Chromium gives them (then an empty batch). */
function folderEntry(name: string, batches: FileSystemEntry[][]): FileSystemDirectoryEntry {
  return {
    isFile: false,
    isDirectory: true,
    name,
    createReader: () => {
      const left = [...batches, []];
      return { readEntries: (ok: (e: FileSystemEntry[]) => void) => ok(left.shift() ?? []) };
    },
  } as unknown as FileSystemDirectoryEntry;
}

describe('droppedFiles()', () => {
  it('droppedFiles() takes a dropped folder as the data files directly inside it, by name', async () => {
    const dir = folderEntry('seal-dma', [
      [fileEntry('seal_10C.txt'), fileEntry('README.md'), fileEntry('seal_2C.txt')],
      [fileEntry('truth.json'), fileEntry('.hidden.csv'), fileEntry('seal.xlsx')],
      [folderEntry('old', [[fileEntry('x.csv')]])],
    ]);
    const files = await droppedFiles([dir, fileEntry('extra.csv')], []);
    expect(files.map((f) => f.name)).toEqual([
      'seal_2C.txt',
      'seal_10C.txt',
      'seal.xlsx',
      'extra.csv',
    ]);
  });

  it('droppedFiles() keeps dropped files as they are when no folder was dropped', async () => {
    const plain = [new File(['a'], 'a.csv')];
    expect(await droppedFiles([fileEntry('a.csv')], plain)).toBe(plain);
  });

  it('droppedFiles() says so when a dropped folder holds no data files', async () => {
    const dir = folderEntry('notes', [[fileEntry('README.md')]]);
    await expect(droppedFiles([dir], [])).rejects.toThrow(/notes folder holds no data files/);
  });
});

describe('useFileDrop()', () => {
  it('useFileDrop() reports a dropped file it cannot read (a damaged workbook) instead of failing silently', async () => {
    const target = new EventTarget() as unknown as Window;
    const errors: string[] = [];
    const got: TextFile[][] = [];
    const scope = effectScope();
    scope.run(() =>
      useFileDrop(
        (f) => got.push(f),
        target,
        (e) => errors.push(e.message),
      ),
    );
    const broken = new File([new Uint8Array([0x50, 0x4b, 3, 4, 1, 2, 3])], 'broken.xlsx');
    const drop = new Event('drop') as DragEvent;
    Object.defineProperty(drop, 'dataTransfer', {
      value: { files: [broken], items: [], types: ['Files'] },
    });
    target.dispatchEvent(drop);
    await expect.poll(() => errors.length).toBe(1);
    expect(errors[0]).toMatch(/broken\.xlsx": this is not a readable \.xlsx workbook/);
    expect(got).toEqual([]);
    scope.stop();
  });
});
