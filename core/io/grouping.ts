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

/** The points to group, in file order, with how each file's layout forms sweeps. */
export interface GroupingInput {
  n: number;
  temperatureK: ArrayLike<number>;
  x: ArrayLike<number>;
  /** File index of each point. */
  file: ArrayLike<number>;
  /**
   * Per file, its layout's sweep rule (FileLayout.sweeps): 'runs' in file order, or 'temperature'
   * (one sweep per distinct temperature, as each column of a wide table is one sweep).
   */
  sweeps: readonly ('runs' | 'temperature')[];
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

interface Sweeps {
  /** Sweep of every point. */
  of: Int32Array;
  count: number;
  size: Int32Array;
  meanK: Float64Array;
  sdK: Float64Array;
}

/**
 * Splits the points into sweeps: in long and one-isotherm files, runs in file order that end
 * where the frequency or time turns back (a new sweep starts) or the temperature jumps by more
 * than the tolerance; in a file whose layout forms sweeps by temperature (a wide table), one sweep
 * per file and temperature.
 */
function sweepsOf(p: GroupingInput, toleranceK: number): Sweeps {
  const of = new Int32Array(p.n);
  const wide = new Map<string, number>();
  let count = 0;
  let prev = -1;
  let dir = 0;
  for (let i = 0; i < p.n; i++) {
    const f = p.file[i];
    if (p.sweeps[f] === 'temperature') {
      const key = `${f}:${p.temperatureK[i]}`;
      let id = wide.get(key);
      if (id === undefined) {
        id = count++;
        wide.set(key, id);
      }
      of[i] = id;
      continue;
    }
    let fresh = prev < 0 || p.file[prev] !== f;
    if (!fresh) {
      const step = Math.sign(p.x[i] - p.x[prev]);
      fresh =
        Math.abs(p.temperatureK[i] - p.temperatureK[prev]) > toleranceK ||
        step === 0 ||
        (dir !== 0 && step !== dir);
      if (!fresh && dir === 0) dir = step;
    }
    if (fresh) {
      count++;
      dir = 0;
    }
    of[i] = count - 1;
    prev = i;
  }
  const size = new Int32Array(count);
  const meanK = new Float64Array(count);
  const sdK = new Float64Array(count);
  for (let i = 0; i < p.n; i++) {
    size[of[i]]++;
    meanK[of[i]] += p.temperatureK[i];
  }
  for (let k = 0; k < count; k++) meanK[k] /= size[k];
  for (let i = 0; i < p.n; i++) sdK[of[i]] += (p.temperatureK[i] - meanK[of[i]]) ** 2;
  for (let k = 0; k < count; k++) sdK[k] = Math.sqrt(sdK[k] / size[k]);
  return { of, count, size, meanK, sdK };
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
  const sw = sweepsOf(p, toleranceK);
  const byMean = Int32Array.from({ length: sw.count }, (_, k) => k).sort(
    (a, b) => sw.meanK[a] - sw.meanK[b] || a - b,
  );
  const complete = (k: number) => sw.size[k] >= MIN_SWEEP_POINTS;
  // Clusters: runs of neighbouring sweeps (by mean temperature) that are not told apart.
  const clusterOf = new Int32Array(sw.count);
  const clusterSize: number[] = [];
  const clusterMean: number[] = [];
  for (let r = 0; r < sw.count; r++) {
    const k = byMean[r];
    const j = r > 0 ? byMean[r - 1] : -1;
    const gap = j >= 0 ? sw.meanK[k] - sw.meanK[j] : Infinity;
    const apart =
      j < 0 ||
      (complete(k) && complete(j) && gap > 0 && gap > DISTINCT_SPREADS * (sw.sdK[k] + sw.sdK[j])) ||
      gap > toleranceK;
    if (apart) {
      clusterSize.push(0);
      clusterMean.push(sw.meanK[k]);
    }
    clusterOf[k] = clusterSize.length - 1;
    clusterSize[clusterSize.length - 1]++;
  }
  // Points of each cluster, by counting sort (file order kept inside a cluster).
  const clusters = clusterSize.length;
  const start = new Int32Array(clusters + 1);
  for (let i = 0; i < p.n; i++) start[clusterOf[sw.of[i]] + 1]++;
  for (let c = 0; c < clusters; c++) start[c + 1] += start[c];
  const points = new Int32Array(p.n);
  const fill = start.slice(0, clusters);
  for (let i = 0; i < p.n; i++) points[fill[clusterOf[sw.of[i]]]++] = i;
  const group = new Int32Array(p.n);
  const cut: boolean[] = [];
  const minK: number[] = [];
  let separateSweeps = 0;
  let cutFromRamps = 0;
  for (let c = 0; c < clusters; c++) {
    const members = points.subarray(start[c], start[c + 1]);
    const temps = new Float64Array(members.length);
    for (let k = 0; k < members.length; k++) temps[k] = p.temperatureK[members[k]];
    temps.sort();
    const bands = groupTemperatures(temps, toleranceK);
    if (clusterSize[c] === 1 && bands.length === 1) {
      const near = (o: number) =>
        o >= 0 && o < clusters && Math.abs(clusterMean[o] - clusterMean[c]) <= toleranceK;
      if (near(c - 1) || near(c + 1)) separateSweeps++;
    }
    const base = cut.length;
    for (const b of bands) {
      cut.push(b.cut);
      minK.push(b.minK);
      if (b.cut) cutFromRamps++;
    }
    if (bands.length === 1) for (const i of members) group[i] = base;
    else for (const i of members) group[i] = base + bandIndex(bands, p.temperatureK[i]);
  }
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
