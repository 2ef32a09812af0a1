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
