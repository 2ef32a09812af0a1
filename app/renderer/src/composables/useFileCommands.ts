/**
 * Opening, saving and exporting, through the FileAccess (desktop or browser). Problems become a
 * message for the user (`notify`), never an exception in the console only.
 */
import { ref, type Ref, type ShallowRef } from 'vue';
import type { Analysis } from '@core/pipeline';
import type { AnalysisDocument } from '../document/analysis-document';
import { newDocument } from '../document/analysis-document';
import { ANALYSIS_FORMAT, parseAnalysis, serializeAnalysis } from '@core/document';
import { analysisFileName } from '../document/analysis-file';
import { exportName, fileStem } from '../exports/export-files';
import { bytesToBase64, zipFiles, type ZipEntry } from '../exports/zip-exports';
import { unitsFromImport } from '../format/display-units';
import { isInventedDemo } from '@core/synthetic';
import { OUTPUT_FILE_SPECS, type OutputFileSpec } from '@core/report';
import type { FileAccess, RecentEntry, TextFile } from '../platform/file-access';
import type { UseImportSessionReturn } from './useImportSession';
import type { UseWorkbenchReturn } from './useWorkbench';

export type Notify = (text: string, kind?: 'info' | 'error') => void;

export interface UseFileCommandsReturn {
  recent: Ref<RecentEntry[]>;
  refreshRecent(): Promise<void>;
  openData(): Promise<void>;
  /** A folder of data files (the dialog; or the browser's folder picker). */
  openFolder(): Promise<void>;
  openAnalysis(): Promise<void>;
  openRecent(id: string): Promise<void>;
  /** Files from drag-and-drop: an analysis file opens, anything else goes to the import preview. */
  openDropped(files: TextFile[]): Promise<void>;
  acceptImport(): void;
  save(): Promise<void>;
  exportOne(file: OutputFileSpec): Promise<void>;
  exportAll(): Promise<void>;
  saveExport(name: string, content: string, encoding: 'utf8' | 'base64'): Promise<void>;
  /** The files the export menu offers (none without an analysis). */
  exportList(): readonly OutputFileSpec[];
}

export interface UseFileCommandsOptions {
  /** Today as YYYY-MM-DD (the report's date). */
  today?: () => string;
  /** Figures (SVG) of every plot view, added to *Export → All*. */
  figures?: () => ZipEntry[];
}

const looksLikeAnalysis = (f: TextFile): boolean =>
  f.text.trimStart().startsWith('{') && f.text.slice(0, 300).includes(`"${ANALYSIS_FORMAT}"`);

export function useFileCommands(
  access: FileAccess,
  wb: UseWorkbenchReturn,
  analysis: ShallowRef<Analysis | null>,
  importer: UseImportSessionReturn,
  notify: Notify,
  options: UseFileCommandsOptions = {},
): UseFileCommandsReturn {
  const today = options.today ?? (() => new Date().toISOString().slice(0, 10));
  const recent = ref<RecentEntry[]>([]);

  const guard = async (what: string, f: () => Promise<void>): Promise<void> => {
    try {
      await f();
    } catch (e) {
      notify(`${what}: ${(e as Error).message}`, 'error');
    }
  };

  /** Opens an analysis file; only a file that parsed goes under Recent. */
  const loadAnalysis = async (f: TextFile, picked: boolean): Promise<void> => {
    const doc: AnalysisDocument = parseAnalysis(f.text, f.name);
    wb.commit(doc);
    notify(`Opened ${f.name}.`);
    await access.rememberRecent('analysis', [f], picked);
  };

  /** Shows data files in the import preview; they go under Recent once the import read them. */
  const previewData = async (files: TextFile[], picked: boolean): Promise<void> => {
    await importer.start(files);
    if (importer.result.value && !importer.error.value)
      await access.rememberRecent('data', files, picked);
  };

  const outputOptions = () => ({
    date: today(),
    modulusUnit: wb.doc.value?.display.modulus ?? 'Pa',
    frequencyUnit: wb.doc.value?.display.frequency ?? 'rad/s',
  });

  const refreshRecent = (): Promise<void> =>
    guard('Recent files', async () => {
      recent.value = await access.listRecent();
    });

  async function exportOne(file: OutputFileSpec): Promise<void> {
    await guard('Export', async () => {
      const a = analysis.value;
      if (!a) return;
      const text = file.build(a, outputOptions());
      if (text === null)
        return notify(`${file.label}: nothing to export for this analysis.`, 'error');
      const written = await access.saveFile({
        suggestedName: exportName(a.sample.name, file.name),
        content: text,
        encoding: 'utf8',
      });
      if (written) notify(`Exported ${written}.`);
    });
  }

  return {
    recent,
    refreshRecent,
    openData: () =>
      guard('Import', async () => {
        const files = await access.openDataFiles();
        if (files.length) await previewData(files, true);
      }),
    openFolder: () =>
      guard('Import folder', async () => {
        const files = await access.openDataFolder();
        if (files.length) await previewData(files, true);
      }),
    openAnalysis: () =>
      guard('Open analysis', async () => {
        const f = await access.openAnalysis();
        if (f) await loadAnalysis(f, true);
      }),
    openRecent: (id) =>
      guard('Recent file', async () => {
        const r = await access.openRecent(id);
        if (r.kind === 'analysis') await loadAnalysis(r.files[0], true);
        else await previewData(r.files, true);
      }),
    openDropped: (files) =>
      guard('Dropped files', async () => {
        if (files.length === 1 && looksLikeAnalysis(files[0])) await loadAnalysis(files[0], false);
        else await previewData(files, false);
      }),
    acceptImport() {
      const r = importer.result.value;
      if (!r) return;
      const names = importer.files.value.map((f) => f.name);
      const origin = names.length > 1 ? `${names[0]} + ${names.length - 1} more` : names[0];
      wb.commit(
        newDocument(r.dataset, origin, {
          importWarnings: r.warnings,
          // the badge only for our own demo data, by the generator's explicit marker
          invented: isInventedDemo(r.dataset.metadata),
          display: unitsFromImport(r),
        }),
      );
      importer.close();
      notify(`Imported ${r.groups.length} isotherms from ${origin}.`);
    },
    save: () =>
      guard('Save', async () => {
        const d = wb.doc.value;
        if (!d) return;
        const name = await access.saveAnalysis(
          analysisFileName(d.dataset.name),
          serializeAnalysis(d),
        );
        if (name) notify(`Saved ${name}.`);
      }),
    async saveExport(name, content, encoding) {
      await guard('Export', async () => {
        const written = await access.saveFile({ suggestedName: name, content, encoding });
        if (written) notify(`Exported ${written}.`);
      });
    },
    exportOne,
    async exportAll() {
      await guard('Export', async () => {
        const a = analysis.value;
        if (!a) return;
        const o = outputOptions();
        const entries: ZipEntry[] = OUTPUT_FILE_SPECS.flatMap((f) => {
          const content = f.build(a, o);
          return content === null ? [] : [{ name: f.name, content }];
        });
        for (const figure of options.figures?.() ?? []) entries.push(figure);
        const stem = fileStem(a.sample.name);
        const zip = zipFiles(stem, entries, new Date());
        const written = await access.saveFile({
          suggestedName: `${stem}-exports.zip`,
          content: bytesToBase64(zip),
          encoding: 'base64',
        });
        if (written) notify(`Exported ${written}: ${entries.length} files in one zip.`);
      });
    },
    exportList: () => (analysis.value ? OUTPUT_FILE_SPECS : []),
  };
}
