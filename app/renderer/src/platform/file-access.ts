/**
 * One small interface for everything that touches the user's files, with two implementations:
 * the desktop app (IPC to Electron main, which owns the dialogs and paths) and the plain browser
 * (file inputs, Blob downloads, IndexedDB and localStorage). Components only see this interface.
 */
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
  /** Lets the user pick data files; [] when cancelled. */
  openDataFiles(): Promise<TextFile[]>;
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

/** Reads dropped or picked File objects as text (UTF-8). */
export async function readFiles(files: Iterable<File>): Promise<TextFile[]> {
  return Promise.all([...files].map(async (f) => ({ name: f.name, text: await f.text() })));
}
