/**
 * Opening, saving and exporting, through the FileAccess (desktop or browser). Problems become a
 * message for the user (`notify`), never an exception in the console only.
 */
import { ref, type Ref, type ShallowRef } from 'vue';
import type { Analysis } from '../../../../core/pipeline/types';
import type { AnalysisDocument } from '../document/analysis-document';
import { newDocument } from '../document/analysis-document';
import {
  ANALYSIS_FORMAT,
  analysisFileName,
  parseAnalysis,
  serializeAnalysis,
} from '../document/analysis-file';
import { fileStem } from '../exports/export-files';
import { OUTPUT_FILE_SPECS, type OutputFileSpec } from '../../../../core/report/output-files';
import type { FileAccess, RecentEntry, TextFile } from '../platform/file-access';
import type { UseImportSessionReturn } from './useImportSession';
import type { UseWorkbenchReturn } from './useWorkbench';

export type Notify = (text: string, kind?: 'info' | 'error') => void;

export interface UseFileCommandsReturn {
  recent: Ref<RecentEntry[]>;
  refreshRecent(): Promise<void>;
  openData(): Promise<void>;
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

const looksLikeAnalysis = (f: TextFile): boolean =>
  f.text.trimStart().startsWith('{') && f.text.slice(0, 300).includes(`"${ANALYSIS_FORMAT}"`);

export function useFileCommands(
  access: FileAccess,
  wb: UseWorkbenchReturn,
  analysis: ShallowRef<Analysis | null>,
  importer: UseImportSessionReturn,
  notify: Notify,
  today: () => string = () => new Date().toISOString().slice(0, 10),
): UseFileCommandsReturn {
  const recent = ref<RecentEntry[]>([]);

  const guard = async (what: string, f: () => Promise<void>): Promise<void> => {
    try {
      await f();
    } catch (e) {
      notify(`${what}: ${(e as Error).message}`, 'error');
    }
  };

  const loadAnalysis = (f: TextFile): void => {
    const doc: AnalysisDocument = parseAnalysis(f.text, f.name);
    wb.commit(doc);
    notify(`Opened ${f.name}.`);
  };

  const refreshRecent = (): Promise<void> =>
    guard('Recent files', async () => {
      recent.value = await access.listRecent();
    });

  async function exportOne(file: OutputFileSpec): Promise<void> {
    await guard('Export', async () => {
      const a = analysis.value;
      if (!a) return;
      const text = file.build(a, { date: today() });
      if (text === null)
        return notify(`${file.label}: nothing to export for this analysis.`, 'error');
      const stem = fileStem(a.sample.name);
      const written = await access.saveFile({
        suggestedName: `${stem}-${file.name}`,
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
        if (files.length) await importer.start(files);
      }),
    openAnalysis: () =>
      guard('Open analysis', async () => {
        const f = await access.openAnalysis();
        if (f) loadAnalysis(f);
      }),
    openRecent: (id) =>
      guard('Recent file', async () => {
        const r = await access.openRecent(id);
        if (r.kind === 'analysis') loadAnalysis(r.files[0]);
        else await importer.start(r.files);
      }),
    openDropped: (files) =>
      guard('Dropped files', async () => {
        if (files.length === 1 && looksLikeAnalysis(files[0])) {
          loadAnalysis(files[0]);
          await access.rememberRecent('analysis', files);
        } else {
          await access.rememberRecent('data', files);
          await importer.start(files);
        }
      }),
    acceptImport() {
      const r = importer.result.value;
      if (!r) return;
      const names = importer.files.value.map((f) => f.name);
      const origin = names.length > 1 ? `${names[0]} + ${names.length - 1} more` : names[0];
      wb.commit(newDocument(r.dataset, origin, { importWarnings: r.warnings }));
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
      if (!analysis.value) return;
      for (const f of OUTPUT_FILE_SPECS) await exportOne(f);
    },
    exportList: () => (analysis.value ? OUTPUT_FILE_SPECS : []),
  };
}
