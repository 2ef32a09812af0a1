/**
 * An independent generator of invented oscillatory test files for the side-by-side benchmark
 * (`npm run bench -- vs`). It deliberately shares no code with core/ (not core/synthetic, not the
 * Prony or shift-law code): its own random numbers, its own relaxation spectra, its own shift laws
 * and its own file writer, so the benchmark checks Thermoshift against data it did not make.
 *
 * A file is a long CSV (one row per point) with Temperature (°C), Angular frequency (rad/s), G′,
 * G″ (Pa) and the complex viscosity |η*| (Pa·s), 2 % multiplicative noise on G′ and G″ (|η*| from
 * the noisy moduli, as an instrument computes it), temperatures 190 °C + k·80/(N − 1) °C, and
 * measured moduli G(T, ω) = G_ref(aT·ω) / bT with the entropic bT = Tref(1 + αV (T − Tref))/T.
 * Everything is invented.
 */

/** Small, fast PRNG (xoshiro128**, Blackman & Vigna 2018) and Marsaglia's polar normals. */
export function xoshiro(seed: number): () => number {
  // splitmix32 expands the seed into the four state words.
  let s = seed >>> 0;
  const split = (): number => {
    s = (s + 0x9e3779b9) >>> 0;
    let z = s;
    z = Math.imul(z ^ (z >>> 16), 0x85ebca6b) >>> 0;
    z = Math.imul(z ^ (z >>> 13), 0xc2b2ae35) >>> 0;
    return (z ^ (z >>> 16)) >>> 0;
  };
  let a = split();
  let b = split();
  let c = split();
  let d = split();
  return () => {
    const r = Math.imul(((Math.imul(b, 5) << 7) | (Math.imul(b, 5) >>> 25)) >>> 0, 9) >>> 0;
    const t = (b << 9) >>> 0;
    c ^= a;
    d ^= b;
    b ^= c;
    a ^= d;
    c = (c ^ t) >>> 0;
    d = ((d << 11) | (d >>> 21)) >>> 0;
    return r / 4294967296;
  };
}

export function polarNormal(uniform: () => number): () => number {
  let spare: number | null = null;
  return () => {
    if (spare !== null) {
      const v = spare;
      spare = null;
      return v;
    }
    for (;;) {
      const u = 2 * uniform() - 1;
      const v = 2 * uniform() - 1;
      const s = u * u + v * v;
      if (s > 0 && s < 1) {
        const f = Math.sqrt((-2 * Math.log(s)) / s);
        spare = v * f;
        return u * f;
      }
    }
  };
}

/** Discrete relaxation spectrum: times λ_i (s) and strengths g_i (Pa). */
interface Spectrum {
  lambdaS: number[];
  strengthPa: number[];
}

/**
 * Continuous spectrum sampled at 40 modes per decade, g_i = H(λ_i)·Δln λ (Ferry, Viscoelastic
 * Properties of Polymers, 3rd ed., 1980, ch. 3).
 */
function sampled(h: (lambda: number) => number, minS: number, maxS: number): Spectrum {
  const perDecade = 40;
  const n = Math.round(Math.log10(maxS / minS) * perDecade) + 1;
  const dln = Math.log(10) / perDecade;
  const lambdaS: number[] = [];
  const strengthPa: number[] = [];
  for (let i = 0; i < n; i++) {
    const lambda = minS * 10 ** (i / perDecade);
    lambdaS.push(lambda);
    strengthPa.push(h(lambda) * dln);
  }
  return { lambdaS, strengthPa };
}

/**
 * BSW spectrum of a monodisperse linear melt, H(λ) = G_N [n_e (λ/λ_max)^n_e + n_g (λ/λ_c)^−n_g]
 * below λ_max (Baumgaertel, Schausberger & Winter, Rheol. Acta 29, 400, 1990; exponents 0.23 and
 * 0.67 as quoted there, from memory). Invented plateau and times.
 */
export function bswSpectrum(): Spectrum {
  const gN = 2e5;
  const lambdaMax = 3;
  const lambdaC = 3e-4;
  return sampled(
    (l) =>
      l > lambdaMax ? 0 : gN * (0.23 * (l / lambdaMax) ** 0.23 + 0.67 * (l / lambdaC) ** -0.67),
    1e-6,
    lambdaMax,
  );
}

/** A broad log-normal spectrum (a polydisperse melt, invented): 1.2 decades wide around 0.05 s. */
export function logNormalSpectrum(): Spectrum {
  const g0 = 6e4;
  const peak = 0.05;
  const width = 1.2;
  return sampled(
    (l) => {
      const z = Math.log10(l / peak) / width;
      return g0 * Math.exp(-0.5 * z * z);
    },
    peak * 1e-6,
    peak * 1e6,
  );
}

/** G′ and G″ of a spectrum at angular frequency ω (rad/s), Pa (Maxwell modes). */
function moduli(s: Spectrum, omega: number): [number, number] {
  let gp = 0;
  let gpp = 0;
  for (let i = 0; i < s.lambdaS.length; i++) {
    const wl = omega * s.lambdaS[i];
    const d = 1 + wl * wl;
    gp += (s.strengthPa[i] * wl * wl) / d;
    gpp += (s.strengthPa[i] * wl) / d;
  }
  return [gp, gpp];
}

export type VsLaw =
  { kind: 'arrhenius'; activationEnergyJPerMol: number } | { kind: 'wlf'; c1: number; c2K: number };

const GAS_CONSTANT = 8.314462618;

/** log10 aT at T (°C) relative to Tref (°C): Arrhenius or WLF, log10 aT < 0 above Tref. */
export function vsLog10aT(law: VsLaw, temperatureC: number, referenceC: number): number {
  if (law.kind === 'wlf') {
    const dT = temperatureC - referenceC;
    return (-law.c1 * dT) / (law.c2K + dT);
  }
  const t = temperatureC + 273.15;
  const tr = referenceC + 273.15;
  return (law.activationEnergyJPerMol / (GAS_CONSTANT * Math.LN10)) * (1 / t - 1 / tr);
}

export interface VsCase {
  label: string;
  isotherms: number;
  points: number;
  law: VsLaw;
  spectrum: 'bsw' | 'lognormal';
  /** Volumetric expansion coefficient αV for the entropic bT, 1/K. */
  expansionPerK: number;
  /** Sweep from high to low frequency (as many rheometers do) instead of low to high. */
  descending: boolean;
  seed: number;
  /** Frequency window, rad/s. @default [0.1, 100] */
  omegaRadPerS?: [number, number];
}

export const REFERENCE_C = 190;
export const SPAN_C = 80;
export const NOISE = 0.02;

export interface VsFile {
  text: string;
  temperaturesC: number[];
  log10aT: number[];
}

/** The CSV text of one case and its true shifts. */
export function vsFile(c: VsCase): VsFile {
  const spectrum = c.spectrum === 'bsw' ? bswSpectrum() : logNormalSpectrum();
  const normal = polarNormal(xoshiro(c.seed));
  const lines: string[] = [
    '# invented benchmark data (bench/vs-generator.ts), not a real material or measurement',
    "Temperature (°C),Angular frequency (rad/s),G' (Pa),G'' (Pa),Complex viscosity (Pa·s)",
  ];
  const temperaturesC: number[] = [];
  const log10aT: number[] = [];
  const omegas: number[] = [];
  const [lo, hi] = c.omegaRadPerS ?? [0.1, 100];
  const decades = Math.log10(hi / lo);
  for (let i = 0; i < c.points; i++) omegas.push(lo * 10 ** ((decades * i) / (c.points - 1)));
  if (c.descending) omegas.reverse();
  const tr = REFERENCE_C + 273.15;
  for (let k = 0; k < c.isotherms; k++) {
    const tC = REFERENCE_C + (k * SPAN_C) / (c.isotherms - 1);
    const aT = 10 ** vsLog10aT(c.law, tC, REFERENCE_C);
    const t = tC + 273.15;
    const bT = (tr * (1 + c.expansionPerK * (t - tr))) / t;
    temperaturesC.push(tC);
    log10aT.push(Math.log10(aT));
    const tText = tC.toFixed(4);
    for (const w of omegas) {
      const [gp0, gpp0] = moduli(spectrum, aT * w);
      const gp = (gp0 / bT) * (1 + NOISE * normal());
      const gpp = (gpp0 / bT) * (1 + NOISE * normal());
      const eta = Math.sqrt(gp * gp + gpp * gpp) / w;
      lines.push(
        `${tText},${w.toPrecision(7)},${gp.toPrecision(6)},${gpp.toPrecision(6)},${eta.toPrecision(6)}`,
      );
    }
  }
  return { text: lines.join('\n') + '\n', temperaturesC, log10aT };
}
