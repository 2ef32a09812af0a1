/** One isotherm's temperature band: every measured temperature in [minK, maxK] belongs to it. */
export interface TemperatureBand {
  minK: number;
  maxK: number;
  /** True when the band was cut out of a continuous run of temperatures (see groupTemperatures). */
  cut: boolean;
}

/**
 * Groups sorted measured temperatures into isotherm bands.
 * Rule: (1) a new band starts wherever the gap to the previous temperature exceeds the tolerance
 * (wandering readings such as 39.8, 40.1, 40.3 °C stay together; set points a few kelvin apart
 * separate); (2) a run that still spans more than the tolerance — a slow continuous ramp — is cut,
 * from its lowest temperature up, into bands no wider than the tolerance, and marked `cut`.
 * `sortedK` must be ascending.
 */
export function groupTemperatures(
  sortedK: ArrayLike<number>,
  toleranceK: number,
): TemperatureBand[] {
  const bands: TemperatureBand[] = [];
  const n = sortedK.length;
  let i = 0;
  while (i < n) {
    let j = i;
    while (j + 1 < n && sortedK[j + 1] - sortedK[j] <= toleranceK) j++;
    const runMin = sortedK[i];
    const runMax = sortedK[j];
    if (runMax - runMin <= toleranceK) {
      bands.push({ minK: runMin, maxK: runMax, cut: false });
    } else {
      let k = i;
      while (k <= j) {
        const start = sortedK[k];
        let e = k;
        while (e + 1 <= j && sortedK[e + 1] - start <= toleranceK) e++;
        bands.push({ minK: start, maxK: sortedK[e], cut: true });
        k = e + 1;
      }
    }
    i = j + 1;
  }
  return bands;
}

/** How the points of a sample were formed into isotherms (reported by the import). */
export interface GroupingSummary {
  toleranceK: number;
  /** Isotherms formed. */
  isotherms: number;
  /**
   * Isotherms kept apart although a neighbour lies closer than the tolerance: each is one
   * complete sweep at a steady temperature distinct from its neighbours'.
   */
  separateSweeps: number;
  /** Isotherms cut out of a continuous run of temperatures (a ramp) into tolerance-wide bands. */
  cutFromRamps: number;
  /** One sentence for people, e.g. for `thermoshift inspect`. */
  description: string;
}

/** The points to group, in file order, with the layout of each file. */
export interface GroupingInput {
  n: number;
  temperatureK: ArrayLike<number>;
  x: ArrayLike<number>;
  /** File index of each point. */
  file: ArrayLike<number>;
  /** Layout of each file: in a wide table each temperature column is one sweep. */
  layouts: readonly ('long' | 'perIsotherm' | 'wide')[];
}

export interface PointGroups {
  /** Group (isotherm) of every point, 0 … count − 1. */
  group: Int32Array;
  count: number;
  /** Per group: true when cut out of a continuous ramp; and its lowest temperature, K. */
  cut: boolean[];
  minK: number[];
  summary: GroupingSummary;
}

/** A sweep holds at least this many points to count as complete. */
const MIN_SWEEP_POINTS = 3;
/**
 * Two sweeps are at distinct temperatures when their means differ by more than this many times
 * the sum of their standard deviations (and by more than nothing): readings that wander about
 * one set point overlap, steady steps do not, and in a continuous ramp the step between sweeps
 * is about as large as the drift within one.
 */
const DISTINCT_SPREADS = 3;

interface Sweep {
  points: number[];
  meanK: number;
  sdK: number;
}

/**
 * Splits the points into sweeps: in long and one-isotherm files, runs in file order that end
 * where the frequency or time turns back (a new sweep starts) or the temperature jumps by more
 * than the tolerance; in a wide table, one sweep per file and temperature column.
 */
function sweepsOf(p: GroupingInput, toleranceK: number): Sweep[] {
  const lists: number[][] = [];
  const open = new Map<string, { list: number[]; dir: number }>();
  let run: { list: number[]; dir: number } | null = null;
  for (let i = 0; i < p.n; i++) {
    const f = p.file[i];
    if (p.layouts[f] === 'wide') {
      const key = `${f}:${p.temperatureK[i]}`;
      let s = open.get(key);
      if (!s) {
        s = { list: [], dir: 0 };
        open.set(key, s);
        lists.push(s.list);
      }
      s.list.push(i);
      continue;
    }
    const prev: number = run && run.list.length > 0 ? run.list[run.list.length - 1] : -1;
    let fresh = run === null || prev < 0 || p.file[prev] !== f;
    if (!fresh) {
      const dx = p.x[i] - p.x[prev];
      const dir = Math.sign(dx);
      fresh =
        Math.abs(p.temperatureK[i] - p.temperatureK[prev]) > toleranceK ||
        dir === 0 ||
        (run!.dir !== 0 && dir !== run!.dir);
      if (!fresh && run!.dir === 0) run!.dir = dir;
    }
    if (fresh) {
      run = { list: [], dir: 0 };
      lists.push(run.list);
    }
    run!.list.push(i);
  }
  return lists.map((points) => {
    let sum = 0;
    for (const i of points) sum += p.temperatureK[i];
    const meanK = sum / points.length;
    let sq = 0;
    for (const i of points) sq += (p.temperatureK[i] - meanK) ** 2;
    return { points, meanK, sdK: Math.sqrt(sq / points.length) };
  });
}

/**
 * Groups points into isotherms by reading how they were measured. Complete sweeps (at least
 * three points) at steady temperatures that are distinct from their neighbours' stay separate
 * isotherms even when closer than the tolerance (e.g. 200 sweeps 0.4 K apart). Everything else —
 * readings wandering about one set point, repeated sweeps at one temperature, a continuous ramp —
 * is grouped by temperature with the tolerance (groupTemperatures: gaps, then ramps cut into
 * tolerance-wide bands).
 */
export function groupPoints(p: GroupingInput, toleranceK: number): PointGroups {
  const sweeps = sweepsOf(p, toleranceK).sort((a, b) => a.meanK - b.meanK);
  const complete = (s: Sweep) => s.points.length >= MIN_SWEEP_POINTS;
  // Clusters: runs of neighbouring sweeps (by mean temperature) that are not told apart.
  const clusters: Sweep[][] = [];
  for (let k = 0; k < sweeps.length; k++) {
    const s = sweeps[k];
    const prev = k > 0 ? sweeps[k - 1] : null;
    const gap = prev ? s.meanK - prev.meanK : Infinity;
    const apart =
      prev === null ||
      (complete(s) && complete(prev) && gap > 0 && gap > DISTINCT_SPREADS * (s.sdK + prev.sdK)) ||
      gap > toleranceK;
    if (apart) clusters.push([s]);
    else clusters[clusters.length - 1].push(s);
  }
  const group = new Int32Array(p.n);
  const cut: boolean[] = [];
  const minK: number[] = [];
  let separateSweeps = 0;
  let cutFromRamps = 0;
  clusters.forEach((cluster, c) => {
    const points = cluster.flatMap((s) => s.points);
    const temps = Float64Array.from(points, (i) => p.temperatureK[i]).sort();
    const bands = groupTemperatures(temps, toleranceK);
    if (cluster.length === 1 && bands.length === 1) {
      const near = (o: Sweep[] | undefined) =>
        o !== undefined && Math.abs(o[0].meanK - cluster[0].meanK) <= toleranceK;
      if (near(clusters[c - 1]) || near(clusters[c + 1])) separateSweeps++;
    }
    const base = cut.length;
    for (const b of bands) {
      cut.push(b.cut);
      minK.push(b.minK);
      if (b.cut) cutFromRamps++;
    }
    for (const i of points) group[i] = base + bandIndex(bands, p.temperatureK[i]);
  });
  const count = cut.length;
  return {
    group,
    count,
    cut,
    minK,
    summary: groupingSummary(toleranceK, count, separateSweeps, cutFromRamps),
  };
}

/** The summary with its sentence, e.g. "200 isotherms: 200 kept apart as complete sweeps …". */
export function groupingSummary(
  toleranceK: number,
  isotherms: number,
  separateSweeps: number,
  cutFromRamps: number,
): GroupingSummary {
  const parts: string[] = [];
  if (separateSweeps > 0)
    parts.push(
      `${separateSweeps} kept apart as complete sweeps at steady, distinct temperatures closer than the ${toleranceK} K tolerance`,
    );
  if (cutFromRamps > 0)
    parts.push(
      `${cutFromRamps} cut from a continuous temperature ramp into bands no wider than ${toleranceK} K`,
    );
  const rest = isotherms - separateSweeps - cutFromRamps;
  if (rest > 0)
    parts.push(
      `${parts.length > 0 ? `${rest} ` : ''}grouped by temperature with a tolerance of ${toleranceK} K`,
    );
  const head = `${isotherms} isotherm${isotherms === 1 ? '' : 's'}`;
  return {
    toleranceK,
    isotherms,
    separateSweeps,
    cutFromRamps,
    description: parts.length > 0 ? `${head}: ${parts.join('; ')}` : head,
  };
}

/** Index of the band holding `temperatureK` (bands from groupTemperatures over the same values). */
export function bandIndex(bands: TemperatureBand[], temperatureK: number): number {
  let lo = 0;
  let hi = bands.length - 1;
  while (lo < hi) {
    const mid = (lo + hi + 1) >> 1;
    if (bands[mid].minK <= temperatureK) lo = mid;
    else hi = mid - 1;
  }
  return lo;
}
