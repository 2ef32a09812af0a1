import type { ImportOptions, ResolvedImportOptions } from './types';
import { ImportError } from './import-error';
import { DEFAULT_MEMORY_BUDGET_BYTES } from './memory-budget';

/** Applies every default of ImportOptions once and checks the values (throws ImportError 'badOption'). */
export function resolveImportOptions(options: ImportOptions = {}): ResolvedImportOptions {
  const tol = options.groupingToleranceK ?? 1;
  if (!(Number.isFinite(tol) && tol >= 0)) {
    throw bad(`groupingToleranceK must be a number of kelvin ≥ 0, got ${String(tol)}`);
  }
  const maxWarn = options.maxWarningsPerFile ?? 200;
  if (!(Number.isInteger(maxWarn) && maxWarn >= 0)) {
    throw bad(`maxWarningsPerFile must be a whole number ≥ 0, got ${String(maxWarn)}`);
  }
  const fileTemperatureK = options.fileTemperatureK ?? {};
  for (const [file, t] of Object.entries(fileTemperatureK)) {
    if (!(Number.isFinite(t) && t > 0)) {
      throw bad(
        `fileTemperatureK["${file}"] must be a temperature in kelvin > 0, got ${String(t)}`,
      );
    }
  }
  const budget = options.memoryBudgetBytes ?? DEFAULT_MEMORY_BUDGET_BYTES;
  if (!(Number.isFinite(budget) && budget > 0)) {
    throw bad(`memoryBudgetBytes must be a number of bytes > 0, got ${String(budget)}`);
  }
  const columns = options.columns ?? [];
  columns.forEach((c, i) => {
    const ok =
      (typeof c.column === 'number' && Number.isInteger(c.column) && c.column >= 1) ||
      (typeof c.column === 'string' && c.column.trim() !== '');
    if (!ok) throw bad(`columns[${i}].column must be a 1-based index or a header text`);
    if (c.temperatureK !== undefined && !(Number.isFinite(c.temperatureK) && c.temperatureK > 0)) {
      throw bad(`columns[${i}].temperatureK must be a temperature in kelvin > 0`);
    }
  });
  return {
    groupingToleranceK: tol,
    columns,
    fileTemperatureK,
    testKind: options.testKind ?? 'auto',
    deformation: options.deformation ?? 'auto',
    sampleName: options.sampleName,
    maxWarningsPerFile: maxWarn,
    deriveQuantities: options.deriveQuantities ?? true,
    memoryBudgetBytes: budget,
  };
}

function bad(message: string): ImportError {
  return new ImportError('badOption', '', 0, 0, `Import option: ${message}.`);
}
