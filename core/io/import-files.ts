import type { Dataset, DeformationMode, QuantityId } from '../data/types';
import { quantityUnit } from '../data/quantities';
import { QUANTITY_IDS } from '../data/types';
import { assembleIsotherms, mergeRecords } from './assemble';
import { deriveQuantities } from './derive';
import { sampleNameFromFileName } from './file-name';
import { importFile } from './file-import';
import type { FileImport } from './file-import';
import { ImportError } from './import-error';
import { layoutById } from './layouts';
import { nameFromMetadata } from './metadata';
import { resolveImportOptions } from './options';
import type { ImportOptions, ImportResult, IsothermGroupReport, SourceFile } from './types';

function settleDeformation(
  reads: FileImport[],
  choice: DeformationMode | 'auto',
): {
  deformation: DeformationMode;
  assumed: boolean;
} {
  if (choice !== 'auto') return { deformation: choice, assumed: false };
  let first: FileImport | undefined;
  for (const r of reads) {
    const mode = r.plan.deformation;
    if (!mode) continue;
    if (first && first.plan.deformation !== mode) {
      throw new ImportError(
        'conflict',
        r.report.file,
        r.report.headerRow,
        0,
        `this file holds ${mode} data but "${first.report.file}" holds ${first.plan.deformation} data; ` +
          'import them as separate samples.',
      );
    }
    first ??= r;
  }
  if (first?.plan.deformation) return { deformation: first.plan.deformation, assumed: false };
  const meta = reads.find((r) => r.metadataDeformation)?.metadataDeformation;
  return meta ? { deformation: meta, assumed: false } : { deformation: 'shear', assumed: true };
}

/**
 * Imports lab files as one sample: recognises each file's layout (long, one file per isotherm,
 * wide), delimiter, decimal separator, metadata, header spellings and units; converts to SI;
 * groups the points into isotherms by temperature (tolerance `groupingToleranceK`); returns the
 * dataset with a report of what was recognised and the warnings for every skipped row.
 * Throws ImportError for problems that stop the import (empty file, no numbers, no temperature,
 * unknown unit, conflicting files).
 */
export function importFiles(files: SourceFile[], options?: ImportOptions): ImportResult {
  const o = resolveImportOptions(options);
  if (!Array.isArray(files) || files.length === 0) {
    throw new ImportError('badOption', '', 0, 0, 'No files were given to import.');
  }
  const reads = files.map((f) => importFile(f, o));
  const first = reads[0];
  for (const r of reads) {
    if (r.plan.testKind !== first.plan.testKind) {
      throw new ImportError(
        'conflict',
        r.report.file,
        r.report.headerRow,
        0,
        `this file holds ${r.plan.testKind} data but "${first.report.file}" holds ${first.plan.testKind} data; ` +
          'import them as separate samples.',
      );
    }
  }
  const { deformation, assumed } = settleDeformation(reads, o.deformation);
  if (assumed) {
    first.sink.add(
      first.report.headerRow,
      0,
      'the headers do not say whether the data are shear (G, J) or tension (E, D); shear was assumed. ' +
        'Choose tension for DMA data.',
    );
  }
  const names = files.map((f) => f.name);
  const merged = mergeRecords(reads.map((r) => r.records));
  const abscissa = first.plan.abscissa;
  const { isotherms, grouping } = assembleIsotherms(
    merged,
    names,
    o.groupingToleranceK,
    abscissa === 'time' ? 'time' : 'frequency',
    (f, row, message) => reads[f].sink.add(row, 0, message),
    reads.map((r) => layoutById(r.plan.layout).sweeps),
  );
  if (isotherms.length === 0) {
    throw new ImportError(
      'noIsotherms',
      names.length === 1 ? names[0] : '',
      0,
      0,
      'no isotherm with at least two points was found. Check the temperatures and the grouping tolerance.',
    );
  }
  const derived = new Set<QuantityId>();
  if (o.deriveQuantities)
    for (const iso of isotherms) deriveQuantities(iso).forEach((q) => derived.add(q));
  const metadata = Object.assign({}, ...reads.map((r) => r.report.metadata)) as Record<
    string,
    string
  >;
  const dataset: Dataset = {
    name: o.sampleName ?? nameFromMetadata(metadata) ?? sampleNameFromFileName(names[0]),
    testKind: first.plan.testKind,
    deformation,
    abscissa,
    isotherms,
    files: names,
    metadata,
  };
  const present = QUANTITY_IDS.filter((q) => isotherms.some((iso) => iso.quantities[q]));
  const groups: IsothermGroupReport[] = isotherms.map((iso) => ({
    id: iso.id,
    temperatureK: iso.temperatureK,
    temperatureSpreadK: iso.temperatureSpreadK,
    points: iso.x.length,
    xMin: iso.x[0],
    xMax: iso.x[iso.x.length - 1],
    files: [...new Set(iso.source.map((s) => s.file))],
    quantities: QUANTITY_IDS.filter((q) => iso.quantities[q]),
  }));
  return {
    dataset,
    warnings: reads.flatMap((r) => r.sink.finish()),
    files: reads.map((r) => ({ ...r.report, deformation })),
    groups,
    grouping,
    derived: QUANTITY_IDS.filter((q) => derived.has(q)),
    abscissa,
    units: Object.fromEntries(present.map((q) => [q, quantityUnit(q)])),
    options: o,
  };
}
