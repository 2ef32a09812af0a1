/**
 * The import preview's state: the files being imported, the import options the user edits
 * (column mapping, file temperatures, grouping tolerance) and the importer's latest answer.
 * Every edit re-runs the import in the worker; nothing is applied until the user accepts.
 */
import { ref, shallowRef, type Ref, type ShallowRef } from 'vue';
import type { ColumnMapping, ImportOptions, ImportResult } from '@core/io';
import type { UseEngineReturn } from '../engine/useEngine';
import type { TextFile } from '../platform/file-access';

export interface UseImportSessionReturn {
  files: ShallowRef<TextFile[]>;
  options: ShallowRef<ImportOptions>;
  result: ShallowRef<ImportResult | null>;
  error: Ref<string | null>;
  busy: Ref<boolean>;
  /** True while the preview is open. */
  active: Ref<boolean>;
  start(files: TextFile[]): Promise<void>;
  /** Sets (or replaces) the mapping of one column of one file. */
  mapColumn(mapping: ColumnMapping): Promise<void>;
  setFileTemperatureK(file: string, temperatureK: number | null): Promise<void>;
  setGroupingToleranceK(k: number): Promise<void>;
  close(): void;
}

export function useImportSession(engine: UseEngineReturn): UseImportSessionReturn {
  const files = shallowRef<TextFile[]>([]);
  const options = shallowRef<ImportOptions>({});
  const result = shallowRef<ImportResult | null>(null);
  const error = ref<string | null>(null);
  const busy = ref(false);
  const active = ref(false);
  let generation = 0;

  async function rerun(): Promise<void> {
    const mine = ++generation;
    busy.value = true;
    const r = await engine.run({ kind: 'import', files: files.value, options: options.value });
    if (mine !== generation) return;
    busy.value = false;
    if (r.kind === 'imported') {
      result.value = r.result;
      error.value = null;
    } else if (r.kind === 'failed') {
      error.value = r.message;
    }
  }

  return {
    files,
    options,
    result,
    error,
    busy,
    active,
    async start(f) {
      files.value = f;
      options.value = {};
      result.value = null;
      error.value = null;
      active.value = true;
      await rerun();
    },
    async mapColumn(m) {
      const rest = (options.value.columns ?? []).filter(
        (c) => !(c.file === m.file && c.column === m.column),
      );
      options.value = { ...options.value, columns: [...rest, m] };
      await rerun();
    },
    async setFileTemperatureK(file, k) {
      const next = { ...(options.value.fileTemperatureK ?? {}) };
      if (k === null) delete next[file];
      else next[file] = k;
      options.value = { ...options.value, fileTemperatureK: next };
      await rerun();
    },
    async setGroupingToleranceK(k) {
      options.value = { ...options.value, groupingToleranceK: k };
      await rerun();
    },
    close() {
      generation++;
      active.value = false;
      busy.value = false;
    },
  };
}
