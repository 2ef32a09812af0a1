import { afterEach, describe, expect, it } from 'vitest';
import {
  fileLayouts,
  ImportError,
  importFiles,
  layoutById,
  layoutText,
  registerLayout,
} from '../../../core/io';
import type { FileLayout, PointRecords } from '../../../core/io';
import { importFile } from '../../../core/io/file-import';
import { resolveImportOptions } from '../../../core/io/options';
import { parseTemperatureText } from '../../../core/units';

/**
 * A toy layout, added through the registry alone: a "step" column numbers the temperature steps,
 * and one line above the table lists the step temperatures ("# step temperatures: 30 °C; 50 °C").
 * No built-in layout reads such a file (it has no temperature column and no temperature line).
 */
const stepLayout: FileLayout = {
  id: 'stepIndexed',
  name: 'step-indexed table',
  description: 'a step column with the step temperatures listed above the table',
  sweeps: 'runs',
  recognise(sample) {
    const step = sample.header.findIndex((h) => h.trim().toLowerCase() === 'step');
    if (step < 0 || sample.metadata['step temperatures'] === undefined) return undefined;
    return { confidence: 0.9, evidence: `column ${step + 1} numbers the temperature steps` };
  },
  read(ctx) {
    const step = ctx.structure.header.findIndex((h) => h.trim().toLowerCase() === 'step');
    const temperaturesK = ctx.structure.metadata['step temperatures'].split(';').map((t) => {
      const r = parseTemperatureText(t.trim());
      if (!r) throw new ImportError('noTemperature', ctx.file, 0, 0, `"${t}" is no temperature`);
      return r.temperatureK;
    });
    return {
      extraColumns: [step],
      perCell: false,
      assemble(table) {
        const { plan } = ctx;
        const col = (c: number) => ({ v: table.values[c]!, ...plan.columns[c] });
        const x = col(plan.xColumn);
        const qs = plan.quantityColumns.map((q) => ({ q: q.quantity, ...col(q.column) }));
        const steps = table.values[step]!;
        const out: PointRecords = {
          n: 0,
          temperatureK: new Float64Array(table.rows),
          x: new Float64Array(table.rows),
          quantities: new Map(qs.map((q) => [q.q, new Float64Array(table.rows)])),
          row: new Int32Array(table.rows),
          usedRows: 0,
        };
        for (let r = 0; r < table.rows; r++) {
          const T = temperaturesK[steps[r] - 1];
          if (T === undefined) {
            ctx.sink.add(
              table.line[r],
              step + 1,
              `step ${steps[r]} has no temperature; row skipped`,
            );
            continue;
          }
          const k = out.n++;
          out.temperatureK[k] = T;
          out.x[k] = x.v[r] * x.factor + x.offset;
          out.row[k] = table.line[r];
          for (const q of qs) out.quantities.get(q.q)![k] = q.v[r] * q.factor + q.offset;
          out.usedRows++;
        }
        return { records: out };
      },
    };
  },
};

const stepFile = {
  name: 'steps.csv',
  text:
    '# step temperatures: 30 °C; 50 °C\n' +
    "step,f (Hz),G' (kPa),G'' (kPa)\n" +
    '1,0.1,100,20\n1,1,200,40\n1,10,400,80\n' +
    '2,0.1,10,3\n2,1,20,6\n2,10,40,12\n3,1,1,1\n',
};

describe('registerLayout()', () => {
  let remove: (() => void) | undefined;
  afterEach(() => {
    remove?.();
    remove = undefined;
  });

  it('registerLayout() adds a layout that importFiles() then recognises and reads', () => {
    remove = registerLayout(stepLayout);
    const r = importFiles([stepFile]);
    expect(r.files[0].layout).toBe('stepIndexed');
    expect(layoutText(r.files[0].layout).name).toBe('step-indexed table');
    expect(r.dataset.isotherms.map((i) => i.temperatureK)).toEqual([303.15, 323.15]);
    const [cold, warm] = r.dataset.isotherms;
    expect(cold.x).toEqual([0.1, 1, 10].map((f) => 2 * Math.PI * f));
    expect(cold.quantities.storageModulus).toEqual([1e5, 2e5, 4e5]);
    expect(warm.quantities.lossModulus).toEqual([3e3, 6e3, 12e3]);
    expect(warm.source.map((s) => s.row)).toEqual([6, 7, 8]);
    expect(r.warnings.map((w) => [w.row, w.column, w.message])).toEqual([
      [9, 1, 'step 3 has no temperature; row skipped'],
    ]);
    const one = importFile(stepFile, resolveImportOptions());
    expect(one.plan.layoutEvidence).toBe('column 1 numbers the temperature steps');
  });

  it('registerLayout() refuses a taken id, and its remover takes the layout out again', () => {
    expect(() => registerLayout({ ...stepLayout, id: 'wide' })).toThrow(/"wide" is already/);
    remove = registerLayout(stepLayout);
    expect(fileLayouts().map((l) => l.id)).toEqual(['wide', 'long', 'perIsotherm', 'stepIndexed']);
    remove();
    remove = undefined;
    expect(() => layoutById('stepIndexed')).toThrow(/No file layout with the id "stepIndexed"/);
    // Without the toy layout the same file is a one-isotherm file without a temperature.
    expect(() => importFiles([stepFile])).toThrow(/no temperature found/);
  });
});

describe('recogniseLayout() through importFile()', () => {
  it('importFile() names the built-in layout and why it was chosen', () => {
    const o = resolveImportOptions();
    const long = importFile({ name: 'l.csv', text: "T (°C),f (Hz),G' (Pa)\n40,1,2\n40,2,3\n" }, o);
    expect([long.plan.layout, long.plan.layoutEvidence]).toEqual([
      'long',
      'column 1 ("T (°C)") gives the temperature of each row',
    ]);
    const wide = importFile({ name: 'w.csv', text: "f (Hz),G' 40°C,G' 60°C\n1,2,3\n2,3,4\n" }, o);
    expect([wide.plan.layout, wide.plan.layoutEvidence]).toEqual([
      'wide',
      '2 columns carry a temperature in the header',
    ]);
    const one = importFile({ name: 'a_40C.csv', text: 't (s),G(t) (Pa)\n1,5\n2,4\n' }, o);
    expect(one.plan.layout).toBe('perIsotherm');
    expect(layoutText('perIsotherm').description).toBe('one file per isotherm');
  });
});
