/**
 * Files dropped anywhere on the window: shows a drop hint while dragging and hands the files over
 * as text (a workbook as one file per sheet). A dropped folder stands for the data files directly
 * inside it, as in the folder dialog. Listeners are removed when the scope is disposed.
 */
import { onScopeDispose, ref, type Ref } from 'vue';
import { byName, isDataFileName, readFiles, type TextFile } from '../platform/file-access';

/** All entries of a dropped folder (the browser hands them out in batches). */
async function folderEntries(dir: FileSystemDirectoryEntry): Promise<FileSystemEntry[]> {
  const reader = dir.createReader();
  const out: FileSystemEntry[] = [];
  for (;;) {
    const batch = await new Promise<FileSystemEntry[]>((resolve, reject) =>
      reader.readEntries(resolve, reject),
    );
    if (batch.length === 0) return out;
    for (const e of batch) out.push(e);
  }
}

const entryFile = (e: FileSystemFileEntry): Promise<File> =>
  new Promise((resolve, reject) => e.file(resolve, reject));

/**
 * The files of a drop: dropped files as they are, each dropped folder as its data files (sorted
 * by name). Entries must be taken from the drop event at once: the browser clears them after it.
 */
export async function droppedFiles(
  entries: (FileSystemEntry | null)[],
  plain: File[],
): Promise<File[]> {
  if (!entries.some((e) => e?.isDirectory)) return plain;
  const out: File[] = [];
  for (const entry of entries) {
    if (!entry) continue;
    if (entry.isFile) out.push(await entryFile(entry as FileSystemFileEntry));
    else if (entry.isDirectory) {
      const inside = (await folderEntries(entry as FileSystemDirectoryEntry)).filter(
        (e) => e.isFile && isDataFileName(e.name),
      );
      if (inside.length === 0) {
        throw new Error(
          `the ${entry.name} folder holds no data files (.csv, .tsv, .txt, .dat, .asc, .xlsx).`,
        );
      }
      const read = await Promise.all(inside.map((e) => entryFile(e as FileSystemFileEntry)));
      for (const f of byName(read)) out.push(f);
    }
  }
  return out;
}

export function useFileDrop(
  onFiles: (files: TextFile[]) => void,
  target: Window = window,
  onError: (e: Error) => void = () => undefined,
): { dragging: Ref<boolean> } {
  const dragging = ref(false);
  let depth = 0;
  const hasFiles = (e: DragEvent): boolean =>
    !!e.dataTransfer && [...e.dataTransfer.types].includes('Files');
  const enter = (e: DragEvent): void => {
    if (!hasFiles(e)) return;
    e.preventDefault();
    depth++;
    dragging.value = true;
  };
  const over = (e: DragEvent): void => {
    if (hasFiles(e)) e.preventDefault();
  };
  const leave = (): void => {
    depth = Math.max(0, depth - 1);
    if (depth === 0) dragging.value = false;
  };
  const drop = (e: DragEvent): void => {
    e.preventDefault();
    depth = 0;
    dragging.value = false;
    const dt = e.dataTransfer;
    if (!dt) return;
    const plain = [...dt.files];
    const entries = [...dt.items]
      .filter((i) => i.kind === 'file')
      .map((i) => (typeof i.webkitGetAsEntry === 'function' ? i.webkitGetAsEntry() : null));
    if (plain.length === 0 && entries.length === 0) return;
    droppedFiles(entries, plain)
      .then(readFiles)
      .then((files) => {
        if (files.length) onFiles(files);
      })
      .catch((err: unknown) => onError(err instanceof Error ? err : new Error(String(err))));
  };
  target.addEventListener('dragenter', enter);
  target.addEventListener('dragover', over);
  target.addEventListener('dragleave', leave);
  target.addEventListener('drop', drop);
  onScopeDispose(() => {
    target.removeEventListener('dragenter', enter);
    target.removeEventListener('dragover', over);
    target.removeEventListener('dragleave', leave);
    target.removeEventListener('drop', drop);
  });
  return { dragging };
}
