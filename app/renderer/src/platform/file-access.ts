/**
 * One small interface for everything that touches the user's files, with two implementations:
 * the desktop app (IPC to Electron main, which owns the dialogs and paths) and the plain browser
 * (file inputs, Blob downloads, IndexedDB and localStorage). Components only see this interface.
 */
import { isWorkbookName, workbookToSourceFiles } from '@core/io';
import type {
  RecentEntry,
  RecentOpened,
  SaveFileRequest,
  TextFile,
} from '../../../shared/ipc-channels';

export type { RecentEntry, RecentOpened, SaveFileRequest, TextFile };

export interface FileAccess {
  /** 'desktop' inside Electron, 'browser' as a web page. */
  readonly kind: 'desktop' | 'browser';
  /** Lets the user pick data files; [] when cancelled. A workbook gives one file per sheet. */
  openDataFiles(): Promise<TextFile[]>;
  /** Lets the user pick a folder: the data files directly inside it; [] when cancelled. */
  openDataFolder(): Promise<TextFile[]>;
  /** Lets the user pick a saved analysis; null when cancelled. */
  openAnalysis(): Promise<TextFile | null>;
  /** Saves an export; returns the name written, or null when cancelled. */
  saveFile(request: SaveFileRequest): Promise<string | null>;
  saveAnalysis(suggestedName: string, text: string): Promise<string | null>;
  listRecent(): Promise<RecentEntry[]>;
  openRecent(id: string): Promise<RecentOpened>;
  /**
   * Lists files under Recent once they opened (the import read them, the analysis parsed), so a
   * file that failed to open is never listed. The browser keeps the files themselves; the
   * desktop app confirms the files its dialog (or Recent) last gave for `kind` — dropped files
   * it cannot remember, as main never learns their paths.
   */
  rememberRecent(kind: RecentEntry['kind'], files: TextFile[], picked: boolean): Promise<void>;
  writeAutosave(text: string): Promise<void>;
  readAutosave(): Promise<string | null>;
}

/** File name endings taken from a folder (notes, images and the like are skipped). */
export const DATA_FILE_PATTERN = /\.(csv|tsv|txt|dat|tab|asc|prn|xlsx)$/i;

/** True for a file a folder import takes: a data file, not hidden. */
export function isDataFileName(name: string): boolean {
  return DATA_FILE_PATTERN.test(name) && !name.startsWith('.');
}

/** Sorts files by name as people number them (pad_2C before pad_10C). */
export function byName<T extends { name: string }>(files: T[]): T[] {
  return [...files].sort((a, b) => a.name.localeCompare(b.name, 'en', { numeric: true }));
}

/**
 * Reads dropped or picked File objects: text as UTF-8; an .xlsx workbook as one file per sheet
 * ("seal.xlsx › 40 °C"), read by core/io/workbook.ts.
 */
export async function readFiles(files: Iterable<File>): Promise<TextFile[]> {
  const read = await Promise.all(
    [...files].map(async (f): Promise<TextFile[]> => {
      if (!isWorkbookName(f.name)) return [{ name: f.name, text: await f.text() }];
      return workbookToSourceFiles(f.name, new Uint8Array(await f.arrayBuffer()));
    }),
  );
  return read.flat();
}
