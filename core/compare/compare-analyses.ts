/**
 * compareAnalyses(reference, others, options): brings every analysis to one reference temperature
 * through its own shift model (flagging extrapolation), smooths each master curve on a shared log
 * grid, and gives per sample the differences in log10 with their s.e., the largest difference and
 * where it occurs, the time shift and modulus offset that map the reference onto the sample, the
 * differences in shift-model constants and indicators, and — with a specification — a verdict per
 * criterion. Pure: no I/O. The method and its limits: docs/compare.md.
 */
import { celsiusToKelvin, kelvinToCelsius } from '../data/temperature';
import type { QuantityId } from '../data/types';
import type { Analysis } from '../pipeline/types';
import { COMPARED_QUANTITIES, MAPPED_QUANTITIES, smoothOnGrid } from './curve-grid';
import { quantityDifference } from './curve-difference';
import { fitOffsets } from './curve-offsets';
import { indicatorDifferences } from './indicator-differences';
import { modelDifference } from './model-differences';
import { bonferroniZ } from './normal';
import { CompareError, resolveCompareOptions, type CompareOptions } from './options';
import { moveToTemperature } from './rereference';
import type { Comparison, RereferencedCurve, SampleComparison } from './types';
import { judge } from './verdicts';

/** Cautions printed with every comparison (CLI, app, report). */
export const COMPARE_CAUTIONS: readonly string[] = [
  'Differences are computed only over the reduced window both curves cover; anything outside it is extrapolation and is not judged.',
  'Moving a curve to another reference temperature uses its own shift model; outside the temperatures that model was fitted over it extrapolates and is flagged.',
  'The comparison assumes time–temperature superposition holds for every material (thermorheologically simple, linear viscoelastic range); check the van Gurp–Palmen plot and the shift quality of each analysis.',
  'A pass against a specification is a statement about these measurements only: confirm by testing, and follow the applicable codes and licensed engineering practice for design decisions.',
];

function quantitiesOf(a: Analysis): QuantityId[] {
  return COMPARED_QUANTITIES.filter((q) =>
    (a.masterCurve.quantities[q] ?? []).some((v) => v !== null && v > 0),
  );
}

interface Prepared {
  curve: RereferencedCurve;
  notes: string[];
}

function prepare(
  a: Analysis,
  T: number,
  quantities: QuantityId[],
  o: ReturnType<typeof resolveCompareOptions>,
): Prepared {
  const moved = moveToTemperature(a, T, o.model, quantities);
  const shiftStdErr = new Map<string, { aT: number; bT: number }>();
  for (const c of a.curves)
    shiftStdErr.set(c.isothermId, { aT: c.log10aTStdErr ?? 0, bT: c.log10bTStdErr ?? 0 });
  const reSe = moved.log10aT.stdErr ?? 0;
  const nodes: RereferencedCurve['nodes'] = {};
  const scatter: RereferencedCurve['scatterDecades'] = {};
  for (const q of quantities) {
    const g = smoothOnGrid(
      {
        log10x: moved.log10x,
        log10y: moved.log10y[q] as number[],
        isothermId: moved.isothermId,
        shiftStdErr,
        rereferenceStdErr: reSe,
      },
      o.binDecades,
    );
    nodes[q] = g.nodes;
    scatter[q] = g.scatterDecades;
  }
  // Placement of the whole curve: isotherm shift s.e. weighted by their share of the points.
  const share = new Map<string, number>();
  for (const id of moved.isothermId)
    share.set(id, (share.get(id) ?? 0) + 1 / moved.isothermId.length);
  // The analysis keeps no covariance between the shifts, and shifts measured against one
  // reference isotherm are positively correlated: take the bound of full correlation,
  // (Σ f_k σ_k)², rather than Σ f_k² σ_k², which understated the scatter of identical pairs.
  let h = 0;
  let v = 0;
  for (const [id, f] of share) {
    const s = shiftStdErr.get(id);
    if (!s) continue;
    h += f * s.aT;
    v += f * s.bT;
  }
  const h2 = reSe * reSe + h * h;
  const v2 = v * v;
  if (moved.log10aT.stdErr === null)
    moved.notes.push(
      `${a.sample.name}: the shift model has no covariance, so moving it to the common temperature adds an unknown uncertainty`,
    );
  return {
    curve: {
      name: a.sample.name,
      ownReferenceK: a.referenceTemperatureK,
      log10aTAtCommon: moved.log10aT,
      log10bTAtCommon: moved.log10bT,
      model: moved.model,
      extrapolated: moved.extrapolated,
      nodes,
      scatterDecades: scatter,
      placementStdErr: { horizontalDecades: Math.sqrt(h2), verticalDecades: Math.sqrt(v2) },
    },
    notes: moved.notes,
  };
}

export function compareAnalyses(
  reference: Analysis,
  others: Analysis[],
  options: CompareOptions = {},
): Comparison {
  if (!reference || !reference.masterCurve)
    throw new CompareError('reference must be an Analysis from buildMasterCurve', 'reference');
  if (!Array.isArray(others) || others.length === 0)
    throw new CompareError('others must hold at least one Analysis to compare', 'others');
  const o = resolveCompareOptions(options, reference.referenceTemperatureK);
  const T = o.referenceTemperatureK;
  for (const a of others) {
    if (a.sample.abscissa !== reference.sample.abscissa)
      throw new CompareError(
        `${a.sample.name} is a ${a.sample.abscissa} curve, the reference ${reference.sample.name} a ${reference.sample.abscissa} curve: they cannot be compared`,
        'others',
      );
    if (a.sample.deformation !== reference.sample.deformation)
      throw new CompareError(
        `${a.sample.name} was measured in ${a.sample.deformation}, the reference ${reference.sample.name} in ${reference.sample.deformation}: compare like with like (E ≈ 3G holds only for an incompressible rubber)`,
        'others',
      );
  }
  const shiftTemps = [...o.shiftTemperaturesK];
  for (const c of o.spec?.criteria ?? [])
    if (
      c.kind === 'shiftFactor' &&
      !shiftTemps.some((t) => Math.abs(t - celsiusToKelvin(c.temperature)) < 1e-6)
    )
      shiftTemps.push(celsiusToKelvin(c.temperature));
  const refQ = quantitiesOf(reference);
  const ref = prepare(reference, T, refQ, o);
  const zDiff = bonferroniZ(2);
  const xUnit = reference.sample.abscissa === 'time' ? 's' : 'rad/s';
  const prepared = others.map((a) =>
    prepare(
      a,
      T,
      refQ.filter((q) => quantitiesOf(a).includes(q)),
      o,
    ),
  );
  const comparisons: SampleComparison[] = others.map((a, k) => {
    const s = prepared[k];
    const warnings = [...ref.notes, ...s.notes];
    const qs = refQ.filter((q) => s.curve.nodes[q]);
    const differences = qs.map((q) =>
      quantityDifference(q, ref.curve.nodes[q] ?? [], s.curve.nodes[q] ?? []),
    );
    if (differences.every((d) => d.log10x.length === 0))
      warnings.push(
        `${a.sample.name}: no common reduced window with the reference at ${kelvinToCelsius(T).toFixed(1)} °C`,
      );
    const pairs = MAPPED_QUANTITIES.filter((q) => qs.includes(q)).map((q) => ({
      quantity: q,
      reference: ref.curve.nodes[q] ?? [],
      sample: s.curve.nodes[q] ?? [],
    }));
    const pr = ref.curve.placementStdErr;
    const ps = s.curve.placementStdErr;
    const offsets = pairs.length
      ? fitOffsets(pairs, reference.sample.abscissa, o.binDecades, o.maxTimeShiftDecades, {
          horizontal: Math.hypot(pr.horizontalDecades, ps.horizontalDecades),
          vertical: Math.hypot(pr.verticalDecades, ps.verticalDecades),
        })
      : null;
    if (offsets && Math.abs(offsets.timeShiftDecades.value) > o.maxTimeShiftDecades - o.binDecades)
      warnings.push(
        `${a.sample.name}: the time shift found lies at the edge of the range searched (±${o.maxTimeShiftDecades} decades): treat it as unreliable`,
      );
    const models = modelDifference(reference, a, shiftTemps, T, o.model);
    const indicators = indicatorDifferences(
      reference,
      a,
      {
        reference: { log10aT: ref.curve.log10aTAtCommon.value, log10bT: ref.curve.log10bTAtCommon },
        sample: { log10aT: s.curve.log10aTAtCommon.value, log10bT: s.curve.log10bTAtCommon },
      },
      offsets?.timeShiftDecades ?? null,
      offsets?.modulusOffsetDecades ?? null,
    );
    const z = (e: { value: number; stdErr: number | null } | undefined): boolean =>
      !!e && e.stdErr !== null && e.stdErr > 0 && Math.abs(e.value) / e.stdErr > zDiff;
    const verdicts = o.spec
      ? judge(o.spec, {
          differences,
          timeShiftDecades: offsets?.timeShiftDecades ?? null,
          modulusOffsetDecades: offsets?.modulusOffsetDecades ?? null,
          models,
          indicators,
          binDecades: o.binDecades,
          xUnit,
        })
      : [];
    const overall: SampleComparison['overall'] = !o.spec
      ? 'no-spec'
      : verdicts.some((v) => v.verdict === 'fail')
        ? 'fail'
        : verdicts.some((v) => v.verdict === 'inconclusive')
          ? 'inconclusive'
          : 'pass';
    return {
      name: a.sample.name,
      differences,
      timeShiftDecades: offsets?.timeShiftDecades ?? null,
      modulusOffsetDecades: offsets?.modulusOffsetDecades ?? null,
      mappingReducedChiSquare: offsets?.reducedChiSquare ?? null,
      models,
      indicators,
      differsBeyondNoise: z(offsets?.timeShiftDecades) || z(offsets?.modulusOffsetDecades),
      verdicts,
      overall,
      warnings,
    };
  });
  return {
    format: 'thermoshift-comparison',
    formatVersion: 1,
    referenceTemperatureK: T,
    abscissa: reference.sample.abscissa,
    quantities: refQ,
    reference: ref.curve,
    samples: prepared.map((p) => p.curve),
    comparisons,
    specName: o.spec?.name ?? null,
    binDecades: o.binDecades,
    cautions: [...COMPARE_CAUTIONS],
  };
}
