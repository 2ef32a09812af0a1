import { formatCelsius } from '../data/temperature';
import type { Isotherm, PointSource, QuantityId } from '../data/types';
import { QUANTITY_IDS } from '../data/types';
import type { GroupingSummary } from './grouping';
import { groupingSummary, groupPoints } from './grouping';
import type { PointRecords } from './records';

/** Points of all files together; `file` indexes the file list. */
export interface MergedPoints {
  n: number;
  temperatureK: Float64Array;
  x: Float64Array;
  quantities: Map<QuantityId, Float64Array>;
  file: Int32Array;
  row: Int32Array;
}

/** Concatenates the records of several files; a quantity a file lacks is NaN for its points. */
export function mergeRecords(records: PointRecords[]): MergedPoints {
  const n = records.reduce((s, r) => s + r.n, 0);
  const out: MergedPoints = {
    n,
    temperatureK: new Float64Array(n),
    x: new Float64Array(n),
    quantities: new Map(),
    file: new Int32Array(n),
    row: new Int32Array(n),
  };
  const ids = QUANTITY_IDS.filter((q) => records.some((r) => r.n > 0 && r.quantities.has(q)));
  for (const q of ids) out.quantities.set(q, new Float64Array(n).fill(NaN));
  let at = 0;
  records.forEach((r, f) => {
    out.temperatureK.set(r.temperatureK.subarray(0, r.n), at);
    out.x.set(r.x.subarray(0, r.n), at);
    out.row.set(r.row.subarray(0, r.n), at);
    out.file.fill(f, at, at + r.n);
    for (const [q, v] of r.quantities) out.quantities.get(q)?.set(v.subarray(0, r.n), at);
    at += r.n;
  });
  return out;
}

const fmtC = (k: number): string => formatCelsius(k);

function sameValues(p: MergedPoints, a: number, b: number): boolean {
  for (const v of p.quantities.values()) {
    const x = v[a];
    const y = v[b];
    if (x !== y && !(x !== x && y !== y)) return false;
  }
  return true;
}

/**
 * Groups points into isotherms (groupPoints: steady sweeps, else temperature bands), sorts each by
 * x, drops repeated x (warning), and leaves out groups with fewer than two distinct x values
 * (warning). Isotherms come back sorted by temperature, ids T01, T02 …, with how they were formed;
 * problems go to `report`. `sweeps`: per file, its layout's sweep rule (default 'runs').
 */
export function assembleIsotherms(
  p: MergedPoints,
  files: string[],
  toleranceK: number,
  xWord: string,
  report: (fileIndex: number, row: number, message: string) => void,
  sweeps: readonly ('runs' | 'temperature')[] = files.map(() => 'runs'),
): { isotherms: Isotherm[]; grouping: GroupingSummary } {
  const src = (i: number): PointSource => ({ file: files[p.file[i]], row: p.row[i] });
  const warn = (i: number, message: string) => report(p.file[i], p.row[i], message);
  const groups = groupPoints({ ...p, sweeps }, toleranceK);
  const bands = groups.cut.map((cut, b) => ({ cut, minK: groups.minK[b] }));
  // Counting sort of the points by group, keeping file order inside a group.
  const band = groups.group;
  const start = new Int32Array(bands.length + 1);
  for (let i = 0; i < p.n; i++) start[band[i] + 1]++;
  for (let b = 0; b < bands.length; b++) start[b + 1] += start[b];
  const order = new Int32Array(p.n);
  const fill = start.slice(0, bands.length);
  for (let i = 0; i < p.n; i++) order[fill[band[i]]++] = i;
  const reportedCut = new Set<number>();
  const isotherms: Isotherm[] = [];
  for (let b = 0; b < bands.length; b++) {
    if (start[b + 1] === start[b]) continue;
    let idx = order.subarray(start[b], start[b + 1]);
    let ascending = true;
    for (let k = 1; k < idx.length && ascending; k++) ascending = p.x[idx[k]] >= p.x[idx[k - 1]];
    if (!ascending) {
      // a sweep from high to low x is put in order by reversing it (what the sort gives when
      // every x is below the one before); anything else is sorted
      let descending = true;
      for (let k = 1; k < idx.length && descending; k++) descending = p.x[idx[k]] < p.x[idx[k - 1]];
      idx = descending
        ? Int32Array.from(idx).reverse()
        : Int32Array.from(idx).sort((a, c) => p.x[a] - p.x[c] || a - c);
    }
    if (bands[b].cut && !reportedCut.has(p.file[idx[0]])) {
      reportedCut.add(p.file[idx[0]]);
      warn(
        idx[0],
        `the temperatures change continuously from about ${fmtC(bands[b].minK)}; they were cut into isotherms no wider than ${toleranceK} K. Check the grouping tolerance.`,
      );
    }
    const keep: number[] = [];
    for (let k = 0; k < idx.length; k++) {
      const i = idx[k];
      const prev = keep.length > 0 ? keep[keep.length - 1] : -1;
      if (prev >= 0 && p.x[i] === p.x[prev]) {
        const at = `${files[p.file[prev]]} row ${p.row[prev]}`;
        warn(
          i,
          sameValues(p, i, prev)
            ? `duplicated row (same values as ${at}); skipped`
            : `same ${xWord} as ${at} in the isotherm near ${fmtC(p.temperatureK[i])} but other values; kept ${at}, skipped this point`,
        );
        continue;
      }
      keep.push(i);
    }
    if (keep.length < 2) {
      warn(
        keep[0],
        `the isotherm near ${fmtC(p.temperatureK[keep[0]])} has only one ${xWord}; an isotherm needs at least two, so it was left out`,
      );
      continue;
    }
    isotherms.push(buildIsotherm(p, keep, src));
  }
  isotherms.sort((a, c) => a.temperatureK - c.temperatureK);
  isotherms.forEach((iso, k) => (iso.id = `T${String(k + 1).padStart(2, '0')}`));
  const g = groups.summary;
  return {
    isotherms,
    grouping: groupingSummary(g.toleranceK, isotherms.length, g.separateSweeps, g.cutFromRamps),
  };
}

function buildIsotherm(p: MergedPoints, keep: number[], src: (i: number) => PointSource): Isotherm {
  let sum = 0;
  let min = Infinity;
  let max = -Infinity;
  for (const i of keep) {
    const t = p.temperatureK[i];
    sum += t;
    if (t < min) min = t;
    if (t > max) max = t;
  }
  const quantities: Isotherm['quantities'] = {};
  for (const [q, v] of p.quantities) {
    const values = keep.map((i) => v[i]);
    if (values.some((y) => y === y)) quantities[q] = values;
  }
  return {
    id: '',
    temperatureK: sum / keep.length,
    temperatureSpreadK: max - min,
    x: keep.map((i) => p.x[i]),
    quantities,
    mask: keep.map(() => true),
    source: keep.map(src),
  };
}
