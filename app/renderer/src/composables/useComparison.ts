/**
 * The comparison workspace's state: the reference and the samples (each an Analysis built by the
 * core), an optional specification, and the comparison (core/compare compareAnalyses). Lots are
 * small, so they are analysed on the page's thread; the invented lot-release demo is generated in
 * place from core/synthetic (the same files as samples/lot-release/).
 */
import { celsiusToKelvin } from '@core/data';
import { shallowRef, computed } from 'vue';
import { importFiles } from '@core/io';
import { buildMasterCurve } from '@core/pipeline';
import type { Analysis } from '@core/pipeline';
import { compareAnalyses, parseSpecification, type Specification } from '@core/compare';
import type { Comparison } from '@core/compare';
import { lotReleaseFiles } from '@core/synthetic';
import { parseAnalysis, ANALYSIS_FILE_SUFFIX } from '@core/document';
import type { TextFile } from '../platform/file-access';

export interface ComparedEntry {
  name: string;
  analysis: Analysis;
}

/** One file as an Analysis: a saved analysis is rebuilt, a data file is one sample. */
export function analysisFromFile(file: TextFile, referenceK?: number): Analysis {
  if (file.name.toLowerCase().endsWith(ANALYSIS_FILE_SUFFIX)) {
    const doc = parseAnalysis(file.text, file.name);
    return buildMasterCurve(doc.dataset, { ...doc.options, importWarnings: doc.importWarnings });
  }
  const imported = importFiles([file], {});
  return buildMasterCurve(imported.dataset, {
    importWarnings: imported.warnings,
    ...(referenceK ? { referenceTemperatureK: referenceK } : {}),
  });
}

export function useComparison() {
  const entries = shallowRef<ComparedEntry[]>([]);
  const spec = shallowRef<Specification | null>(null);
  const specName = shallowRef<string>('');
  const error = shallowRef<string | null>(null);
  const invented = shallowRef(false);

  const comparison = computed<Comparison | null>(() => {
    const [ref, ...rest] = entries.value;
    if (!ref || rest.length === 0) return null;
    try {
      return compareAnalyses(
        ref.analysis,
        rest.map((e) => e.analysis),
        spec.value ? { spec: spec.value } : {},
      );
    } catch (e) {
      error.value = (e as Error).message;
      return null;
    }
  });

  const specK = (): number | undefined =>
    spec.value?.referenceTemperature !== undefined
      ? celsiusToKelvin(spec.value.referenceTemperature)
      : undefined;

  function add(files: TextFile[], asReference: boolean): void {
    error.value = null;
    try {
      const built = files.map((f) => ({ name: f.name, analysis: analysisFromFile(f, specK()) }));
      entries.value = asReference
        ? // the first file replaces the reference; any more join the samples
          [...built.slice(0, 1), ...entries.value.slice(1), ...built.slice(1)]
        : [...entries.value, ...built];
    } catch (e) {
      error.value = (e as Error).message;
    }
  }

  function setSpec(file: TextFile): void {
    error.value = null;
    try {
      spec.value = parseSpecification(file.text, file.name);
      specName.value = file.name;
    } catch (e) {
      error.value = (e as Error).message;
    }
  }

  function remove(k: number): void {
    entries.value = entries.value.filter((_, i) => i !== k);
  }

  /** The invented lot-release demo: reference lot, three lots, and its specification. */
  function loadDemo(): void {
    const files = lotReleaseFiles();
    const specFile = files.find((f) => f.path.endsWith('.spec.json'));
    if (specFile)
      setSpec({ name: specFile.path.split('/').pop() ?? 'spec.json', text: specFile.content });
    entries.value = [];
    add(
      files
        .filter((f) => f.path.endsWith('.csv'))
        .map((f) => ({ name: f.path.split('/').pop() ?? f.path, text: f.content })),
      true,
    );
    invented.value = true;
  }

  function clear(): void {
    entries.value = [];
    spec.value = null;
    specName.value = '';
    invented.value = false;
  }

  return {
    entries,
    spec,
    specName,
    error,
    comparison,
    invented,
    add,
    setSpec,
    remove,
    loadDemo,
    clear,
  };
}
