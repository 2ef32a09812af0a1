/**
 * The one list of IPC channels, from channel name to request and response types. Main, preload
 * and renderer all import it, so a channel cannot drift between the three. Every channel is
 * request/response (`invoke`/`handle`); the renderer never gets file-system paths: main chooses
 * them through dialogs and refers to remembered files by an opaque id.
 */

/** A text file as the renderer sees it: its base name (no folder) and its content. */
export interface TextFile {
  name: string;
  text: string;
}

/** A file to write through a save dialog. PNG images travel as base64. */
export interface SaveFileRequest {
  /** File name proposed in the dialog (no folder), e.g. "master-curve.csv". */
  suggestedName: string;
  content: string;
  encoding: 'utf8' | 'base64';
}

/** Where a save went, as a name to show (no folder); null when the user cancelled. */
export type SaveOutcome = { name: string } | null;

export type RecentKind = 'data' | 'analysis';

/** One remembered file or group of files opened together. */
export interface RecentEntry {
  /** Opaque id; main maps it to paths it chose itself. */
  id: string;
  kind: RecentKind;
  /** What the list shows, e.g. "melt_150C.csv + 8 more". */
  label: string;
  /** ISO 8601 time it was last opened. */
  openedAt: string;
}

/** A remembered entry, read again from disk. */
export interface RecentOpened {
  kind: RecentKind;
  files: TextFile[];
}

export interface IpcChannels {
  /** Dialog to pick one or more data files; [] when cancelled. */
  'data-files:open': { request: void; response: TextFile[] };
  /**
   * Dialog to pick a folder: the data files directly inside it (an .xlsx workbook gives one file
   * per sheet); [] when cancelled.
   */
  'data-folder:open': { request: void; response: TextFile[] };
  /** Save dialog for an export (CSV, HTML, PNG, SVG, JSON). */
  'file:save': { request: SaveFileRequest; response: SaveOutcome };
  /** Dialog to pick a saved analysis; null when cancelled. */
  'analysis:open': { request: void; response: TextFile | null };
  /** Save dialog for the analysis file. */
  'analysis:save': { request: { suggestedName: string; text: string }; response: SaveOutcome };
  'recent:list': { request: void; response: RecentEntry[] };
  'recent:open': { request: { id: string }; response: RecentOpened };
  /**
   * The files last picked (or reopened) for `kind` did open: only now are they added to the
   * recent list, so files that failed to open are never listed.
   */
  'recent:confirm': { request: { kind: RecentKind }; response: true };
  /** Keeps the current analysis so a crash loses nothing. */
  'autosave:write': { request: { text: string }; response: true };
  'autosave:read': { request: void; response: string | null };
}

export type IpcChannel = keyof IpcChannels;
export type IpcRequest<C extends IpcChannel> = IpcChannels[C]['request'];
export type IpcResponse<C extends IpcChannel> = IpcChannels[C]['response'];
