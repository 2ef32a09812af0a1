import type { QuantityId } from '../data/types';
import type { CellProblem, ScannedTable } from './scan-table';
import { ROLE_WORDS } from './roles';
import type { ColumnPlan, ColumnReport } from './types';
import type { WarningSink } from './warning-sink';
import type { BlockPlan } from './blocks';
import { SENTINEL_MAGNITUDE, implausibleValue, implausibleX } from './plausible';

/** Points read from one file, in stored units (K, rad/s or s, Pa …), columnar. */
export interface PointRecords {
  n: number;
  temperatureK: Float64Array;
  x: Float64Array;
  quantities: Map<QuantityId, Float64Array>;
  /** 1-based line in the file. */
  row: Int32Array;
  /** Table rows that gave at least one point. */
  usedRows: number;
}

function problemText(p: CellProblem, header: string): string {
  const where = header ? `column "${header}"` : `column ${p.column}`;
  switch (p.kind) {
    case 'empty':
      return `empty cell in ${where}`;
    case 'missing':
      return `the row ends before ${where}`;
    case 'nan':
      return `"${p.text}" in ${where} is not a measured value`;
    case 'nonNumeric':
      return `"${p.text}" in ${where} is not a number`;
    case 'ambiguousGrouping':
      return (
        `"${p.text}" in ${where} could be a decimal or a number with a thousands separator; ` +
        'write it without the separator (e.g. 1234) or with a decimal part (1,234.0)'
      );
  }
}

/** Why a converted value cannot be used, or undefined when it is fine. */
function valueProblem(q: QuantityId, v: number): string | undefined {
  if (q === 'phaseAngle') return v >= 0 && v <= 90 ? undefined : 'outside 0–90°';
  return v > 0 ? implausibleValue(q, v) : 'not positive';
}

interface Converter {
  values: Float64Array;
  factor: number;
  offset: number;
  header: string;
}

function converter(table: ScannedTable, col: ColumnReport): Converter {
  return {
    values: table.values[col.index - 1]!,
    factor: col.factor,
    offset: col.offset,
    header: col.header,
  };
}

/**
 * Turns the scanned table into points: converts to stored units, checks each value (temperature
 * above 0 K, x > 0 and within 1e-12…1e12, moduli/compliance/viscosity/tan δ > 0, moduli ≤ 1e13
 * Pa, no sentinel such as 9.9e37 — see plausible.ts; phase angle 0–90°) and skips what fails
 * with a warning naming file, row and column. Long and per-isotherm tables skip whole rows; wide
 * tables skip single points.
 */
export function buildRecords(
  table: ScannedTable,
  plan: ColumnPlan,
  fileTemperatureK: number | undefined,
  sink: WarningSink,
  blocks: BlockPlan = { starts: [], quietRows: new Set() },
): PointRecords {
  for (const p of table.problems) {
    if (blocks.quietRows.has(p.row)) continue;
    sink.add(
      p.line,
      p.column,
      `${problemText(p, plan.columns[p.column - 1]?.header ?? '')}; ${plan.layout === 'wide' ? 'point' : 'row'} skipped`,
    );
  }
  sink.addUnlisted(table.problemCount - table.problems.length);
  const xc = converter(table, plan.columns[plan.xColumn]);
  const tc =
    plan.temperatureColumn >= 0
      ? converter(table, plan.columns[plan.temperatureColumn])
      : undefined;
  const groups = new Map<number, { q: QuantityId; c: Converter; column: number }[]>();
  for (const qc of plan.quantityColumns) {
    const key = qc.temperatureK ?? fileTemperatureK ?? NaN;
    const list = groups.get(key) ?? [];
    list.push({
      q: qc.quantity,
      c: converter(table, plan.columns[qc.column]),
      column: qc.column + 1,
    });
    groups.set(key, list);
  }
  const perRow = plan.layout === 'wide' ? groups.size : 1;
  const capacity = table.rows * perRow;
  const out: PointRecords = {
    n: 0,
    temperatureK: new Float64Array(capacity),
    x: new Float64Array(capacity),
    // One array per quantity (a wide table has many columns of the same quantity).
    quantities: new Map(
      [...new Set(plan.quantityColumns.map((qc) => qc.quantity))].map((q) => [
        q,
        new Float64Array(capacity),
      ]),
    ),
    row: new Int32Array(capacity),
    usedRows: 0,
  };
  const xWord = plan.abscissa === 'time' ? 'time' : 'frequency';
  const qArrays = [...groups.values()].map((list) => list.map((e) => out.quantities.get(e.q)!));
  // the groups as an array: the loop below visits them once per row
  const groupList = [...groups];
  // One-isotherm files made of several temperature blocks: the block's temperature applies.
  const starts = plan.layout === 'perIsotherm' ? blocks.starts : [];
  let block = -1;
  let blockT = NaN;
  for (let r = 0; r < table.rows; r++) {
    while (block + 1 < starts.length && starts[block + 1].row <= r)
      blockT = starts[++block].temperatureK;
    const line = table.line[r];
    const xRaw = xc.values[r];
    if (xRaw !== xRaw) continue; // reported by the scan
    const x = xRaw * xc.factor + xc.offset;
    if (!(x > 0)) {
      sink.add(
        line,
        plan.xColumn + 1,
        `${xWord} ${xRaw} in column "${xc.header}" is not positive; row skipped`,
      );
      continue;
    }
    const xWhy = implausibleX(x, plan.abscissa === 'time' ? 's' : 'rad/s');
    if (xWhy) {
      sink.add(
        line,
        plan.xColumn + 1,
        `${xWord} ${xRaw} in column "${xc.header}" ${xWhy}; row skipped`,
      );
      continue;
    }
    let rowT = NaN;
    if (tc) {
      const tRaw = tc.values[r];
      if (tRaw !== tRaw) continue;
      rowT = tRaw * tc.factor + tc.offset;
      if (Math.abs(tRaw) >= SENTINEL_MAGNITUDE) {
        sink.add(
          line,
          plan.temperatureColumn + 1,
          `temperature ${tRaw} in column "${tc.header}" is an instrument placeholder; row skipped`,
        );
        continue;
      }
      if (!(rowT > 0)) {
        sink.add(
          line,
          plan.temperatureColumn + 1,
          `temperature ${tRaw} in column "${tc.header}" is below absolute zero; row skipped`,
        );
        continue;
      }
    }
    let used = false;
    let g = 0;
    for (let gi = 0; gi < groupList.length; gi++) {
      const [groupT, list] = groupList[gi];
      const arrays = qArrays[g++];
      const T = tc ? rowT : block >= 0 ? blockT : groupT;
      let ok = true;
      for (let j = 0; j < list.length && ok; j++) {
        const { q, c, column } = list[j];
        const raw = c.values[r];
        if (raw !== raw) {
          ok = false;
          break;
        }
        const v = raw * c.factor + c.offset;
        const why = valueProblem(q, v);
        if (why) {
          sink.add(
            line,
            column,
            `${ROLE_WORDS[q]} ${raw} in column "${c.header}" is ${why}; ${perRow > 1 ? 'point' : 'row'} skipped`,
          );
          ok = false;
        }
      }
      if (!ok) continue;
      const k = out.n++;
      out.temperatureK[k] = T;
      out.x[k] = x;
      out.row[k] = line;
      for (let j = 0; j < list.length; j++) {
        const c = list[j].c;
        arrays[j][k] = c.values[r] * c.factor + c.offset;
      }
      used = true;
    }
    if (used) out.usedRows++;
  }
  return out;
}
