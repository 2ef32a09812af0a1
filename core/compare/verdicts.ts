/**
 * Judges a sample against each criterion of a specification. A difference d with s.e. s and an
 * allowed range [lo, hi]: pass when the whole 95 % interval d ± 1.96 s lies inside, fail when it
 * lies wholly outside, inconclusive when it straddles a limit (more data, or a tighter curve,
 * would decide). For a curve band the rule is applied node by node and the worst node speaks: any
 * failing node fails the band, else any straddling node makes it inconclusive. Without an s.e. the
 * verdict rests on the value alone and the reason says so. See docs/compare.md.
 */
import { celsiusToKelvin } from '../data/temperature';
import type { QuantityId } from '../data/types';
import { normalCdf } from '../numeric';
import { Z95 } from './normal';
import { criterionName, type SpecCriterion, type Specification } from './spec-schema';
import type { SpecVerdict } from './spec-types';
import type { Estimate, ModelDifference, IndicatorDifference, QuantityDifference } from './types';

export interface VerdictInput {
  differences: QuantityDifference[];
  timeShiftDecades: Estimate | null;
  modulusOffsetDecades: Estimate | null;
  models: ModelDifference;
  indicators: IndicatorDifference[];
  binDecades: number;
  /** Unit of the reduced abscissa, for messages. */
  xUnit: string;
}

const LABEL: Partial<Record<QuantityId, string>> = {
  storageModulus: 'storage modulus',
  lossModulus: 'loss modulus',
  tanDelta: 'tan δ',
  complexViscosity: '|η*|',
  relaxationModulus: 'relaxation modulus',
};

const fmtDigits = (v: number, d: number): string =>
  Math.abs(v) >= 100 ? v.toFixed(0) : v.toFixed(d);
const fmt = (v: number, d = 2): string => (Math.abs(v) >= 100 ? v.toFixed(0) : v.toFixed(d));
const pct = (p: number | null): string =>
  p === null ? '' : p > 0.999 ? '> 99.9 %' : p < 0.001 ? '< 0.1 %' : `${(p * 100).toFixed(1)} %`;

function probabilityOutside(d: number, s: number, lo: number, hi: number): number {
  return normalCdf((lo - d) / s) + 1 - normalCdf((hi - d) / s);
}

function state(d: number, s: number | null, lo: number, hi: number): SpecVerdict['verdict'] {
  const h = s === null ? 0 : Z95 * s;
  if (d - h >= lo && d + h <= hi) return 'pass';
  if (d + h < lo || d - h > hi) return 'fail';
  return 'inconclusive';
}

function sentence(
  what: string,
  verdict: SpecVerdict['verdict'],
  d: number,
  s: number | null,
  lo: number,
  hi: number,
  unit: string,
  p: number | null,
): string {
  const u = unit === '%' ? ' %' : ` ${unit}`;
  const fmt = (v: number): string => fmtDigits(v, unit === 'decades' ? 3 : 2);
  const found = `${what} differs by ${d >= 0 ? '+' : ''}${fmt(d)}${u}${s === null ? ' (uncertainty unknown: judged on the value alone)' : ` ± ${fmt(s)}${u} (s.e.)`}`;
  const limit =
    d > hi
      ? `upper limit +${fmt(hi)}${u}`
      : d < lo
        ? `lower limit ${fmt(lo)}${u}`
        : `limits ${fmt(lo)} … +${fmt(hi)}${u}`;
  const beyond = d > hi ? d - hi : d < lo ? lo - d : 0;
  const conf =
    p === null ? '' : `; probability that the true difference lies outside the limits: ${pct(p)}`;
  if (verdict === 'fail')
    return `FAIL: ${found}, beyond the ${limit} by ${fmt(beyond)}${u}${conf}.`;
  if (verdict === 'pass') return `pass: ${found}, inside the ${limit} with 95 % confidence${conf}.`;
  return `inconclusive: ${found}; the 95 % interval straddles the ${limit}${conf}.`;
}

/** A criterion that could not be judged: inconclusive, with the reason. */
function notJudged(
  head: Pick<SpecVerdict, 'criterion' | 'kind' | 'limits' | 'unit'>,
  reason: string,
): SpecVerdict {
  return {
    ...head,
    verdict: 'inconclusive',
    value: null,
    stdErr: null,
    probabilityOutside: null,
    reason: `inconclusive: ${reason}`,
  };
}

function scalar(
  name: string,
  kind: string,
  what: string,
  e: Estimate | null,
  lo: number,
  hi: number,
  unit: string,
  missing: string,
): SpecVerdict {
  if (!e) return notJudged({ criterion: name, kind, limits: [lo, hi], unit }, `${missing}.`);
  const v = state(e.value, e.stdErr, lo, hi);
  const p =
    e.stdErr !== null && e.stdErr > 0 ? probabilityOutside(e.value, e.stdErr, lo, hi) : null;
  return {
    criterion: name,
    kind,
    verdict: v,
    value: e.value,
    stdErr: e.stdErr,
    limits: [lo, hi],
    unit,
    probabilityOutside: p,
    reason: sentence(what, v, e.value, e.stdErr, lo, hi, unit, p),
  };
}

/** log10 ratio with s.e. → percent with s.e. (delta method). */
export function toPercent(e: Estimate): Estimate {
  const r = 10 ** e.value;
  return {
    value: (r - 1) * 100,
    stdErr: e.stdErr === null ? null : Math.LN10 * r * e.stdErr * 100,
  };
}

function curveVerdict(
  c: Extract<SpecCriterion, { kind: 'curve' }>,
  name: string,
  input: VerdictInput,
): SpecVerdict {
  const lowerP = c.lowerPercent ?? (c.tolerancePercent as number);
  const upperP = c.upperPercent ?? (c.tolerancePercent as number);
  const lo = Math.log10(1 - lowerP / 100);
  const hi = Math.log10(1 + upperP / 100);
  const limits: [number, number] = [-lowerP, upperP];
  const label = LABEL[c.quantity] ?? c.quantity;
  const [r0, r1] = c.reducedRange;
  const [from, to] = r0 <= r1 ? [r0, r1] : [r1, r0];
  const diff = input.differences.find((d) => d.quantity === c.quantity);
  const base = { criterion: name, kind: 'curve', limits, unit: '%' };
  const range = `${fmt(from, 3)}–${fmt(to, 3)} ${input.xUnit}`;
  if (!diff || diff.log10x.length === 0)
    return notJudged(base, `${label} was not measured on both curves at the common temperature.`);
  const [u0, u1] = [Math.log10(from), Math.log10(to)];
  const half = input.binDecades / 2 + 1e-9;
  const idx = diff.log10x
    .map((u, i) => i)
    .filter((i) => diff.log10x[i] >= u0 - half && diff.log10x[i] <= u1 + half);
  const covered =
    idx.length > 0 &&
    diff.log10x[idx[0]] <= u0 + half &&
    diff.log10x[idx[idx.length - 1]] >= u1 - half;
  if (!covered) {
    const w = diff.window
      ? `${fmt(diff.window[0], 3)}–${fmt(diff.window[1], 3)} ${input.xUnit}`
      : 'none';
    return notJudged(
      base,
      `the band ${range} is not covered by the common reduced window of both curves (${w}); extending beyond it would be extrapolation.`,
    );
  }
  let worst = idx[0];
  let worstP = -1;
  let anyFail = false;
  let anyOpen = false;
  for (const i of idx) {
    const s = state(diff.log10Difference[i], diff.stdErr[i], lo, hi);
    if (s === 'fail') anyFail = true;
    if (s === 'inconclusive') anyOpen = true;
    const p = probabilityOutside(diff.log10Difference[i], diff.stdErr[i], lo, hi);
    if (p > worstP) {
      worstP = p;
      worst = i;
    }
  }
  const verdict: SpecVerdict['verdict'] = anyFail ? 'fail' : anyOpen ? 'inconclusive' : 'pass';
  const e = toPercent({ value: diff.log10Difference[worst], stdErr: diff.stdErr[worst] });
  const at = `${label} at ${fmt(10 ** diff.log10x[worst], 3)} ${input.xUnit} (worst of ${idx.length} points in ${range})`;
  return {
    ...base,
    verdict,
    value: e.value,
    stdErr: e.stdErr,
    probabilityOutside: worstP,
    reason: sentence(at, verdict, e.value, e.stdErr, -lowerP, upperP, '%', worstP),
  };
}

export function judge(spec: Specification, input: VerdictInput): SpecVerdict[] {
  return spec.criteria.map((c, k) => {
    const name = criterionName(c, k);
    switch (c.kind) {
      case 'curve':
        return curveVerdict(c, name, input);
      case 'timeShift':
        return scalar(
          name,
          c.kind,
          'the time shift between the curves (relaxation times, decades)',
          input.timeShiftDecades,
          -c.maxDecades,
          c.maxDecades,
          'decades',
          'the curves could not be mapped onto each other (too little overlap)',
        );
      case 'modulusLevel':
        return scalar(
          name,
          c.kind,
          'the modulus level',
          input.modulusOffsetDecades && toPercent(input.modulusOffsetDecades),
          -c.tolerancePercent,
          c.tolerancePercent,
          '%',
          'the curves could not be mapped onto each other (too little overlap)',
        );
      case 'activationEnergy':
        return scalar(
          name,
          c.kind,
          'the Arrhenius activation energy',
          input.models.activationEnergyKJPerMol,
          -c.toleranceKJPerMol,
          c.toleranceKJPerMol,
          'kJ/mol',
          'an Arrhenius fit is missing for the reference or the sample',
        );
      case 'shiftFactor': {
        const T = celsiusToKelvin(c.temperature);
        const row = input.models.shiftAt.find((r) => Math.abs(r.temperatureK - T) < 1e-6);
        return scalar(
          name,
          c.kind,
          `log10 aT at ${c.temperature} °C`,
          row?.difference ?? null,
          -c.toleranceDecades,
          c.toleranceDecades,
          'decades',
          'a shift model is missing for the reference or the sample',
        );
      }
      case 'indicator': {
        const ind = input.indicators.find((i) => i.key === c.key);
        return scalar(
          name,
          c.kind,
          ind ? ind.label : c.key,
          ind ? toPercent(ind.log10Ratio) : null,
          -c.tolerancePercent,
          c.tolerancePercent,
          '%',
          `the indicator "${c.key}" was not found for both the reference and the sample`,
        );
      }
    }
  });
}
