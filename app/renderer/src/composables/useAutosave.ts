/**
 * Autosave: a short while after every change, the current analysis (data, settings, manual
 * changes) is written through the FileAccess (localStorage/IndexedDB in a browser, a file in the
 * desktop app's user folder), so a crash loses nothing. Also flushed when the page is hidden.
 */
import { onScopeDispose, ref, watch, type Ref } from 'vue';
import type { AnalysisDocument } from '../document/analysis-document';
import { serializeAnalysis } from '@core/document';
import type { FileAccess } from '../platform/file-access';

export interface UseAutosaveOptions {
  /** Quiet time after the last change before writing, ms. @default 800 */
  delayMs?: number;
}

export interface UseAutosaveReturn {
  /** Time of the last successful autosave, or null. */
  savedAt: Ref<Date | null>;
  /** Message of the last failed autosave, or null. */
  error: Ref<string | null>;
  flush(): Promise<void>;
}

export function useAutosave(
  doc: Ref<AnalysisDocument | null>,
  access: FileAccess,
  options: UseAutosaveOptions = {},
): UseAutosaveReturn {
  const delay = options.delayMs ?? 800;
  const savedAt = ref<Date | null>(null);
  const error = ref<string | null>(null);
  let timer: ReturnType<typeof setTimeout> | null = null;
  let dirty: AnalysisDocument | null = null;

  async function flush(): Promise<void> {
    if (timer) clearTimeout(timer);
    timer = null;
    const d = dirty;
    dirty = null;
    if (!d) return;
    try {
      await access.writeAutosave(serializeAnalysis(d));
      savedAt.value = new Date();
      error.value = null;
    } catch (e) {
      error.value = `Autosave failed: ${(e as Error).message}`;
    }
  }

  watch(doc, (d) => {
    if (!d) return;
    dirty = d;
    if (timer) clearTimeout(timer);
    timer = setTimeout(() => void flush(), delay);
  });

  const onHide = (): void => {
    if (document.visibilityState === 'hidden') void flush();
  };
  document.addEventListener('visibilitychange', onHide);
  onScopeDispose(() => {
    document.removeEventListener('visibilitychange', onHide);
    void flush();
  });
  return { savedAt, error, flush };
}
