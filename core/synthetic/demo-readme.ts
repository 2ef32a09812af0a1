/**
 * README text for each invented sample folder and for samples/ itself: what the data is, that it
 * is invented, its layout and units, the true model, how to regenerate it, and the cautions.
 */
import type { DemoScenario } from './demo-types';
import type { DemoTruth } from './demo-truth';

function layoutText(s: DemoScenario): string {
  const stated = s.setPointsC.filter((_, k) => k % 2 === 0).join(', ');
  const named = s.setPointsC.find((_, k) => k % 2 === 1) ?? s.setPointsC[0];
  const text: Record<DemoScenario['layout'], string> = {
    long:
      'Long layout: one comma-delimited table, one row per point, with a temperature column; ' +
      'a header row with a units row under it; `# key: value` metadata lines at the top; LF line ends.',
    'per-isotherm':
      'One file per isotherm: semicolon delimiter, decimal comma, CRLF line ends. The files for ' +
      `${stated} °C state the temperature in a \`# Temperature: … °C\` line; the others carry it ` +
      `only in the file name (\`…_${named}C.txt\`).`,
    wide:
      'Wide layout: one shared time column and one column per temperature (the temperature is in ' +
      'the column header), tab-delimited, moduli in exponent style (`1.2345E+02`); LF line ends.',
    ramp:
      'Long layout from a temperature ramp: one row per point with the measured temperature, ' +
      'columns aligned with runs of spaces, units in brackets; LF line ends. Group rows into ' +
      'isotherms with a temperature tolerance (1 K works).',
  };
  return text[s.layout];
}

function lawText(t: DemoTruth): string {
  const l = t.shiftLaw;
  return l.kind === 'wlf'
    ? `WLF, C1 = ${l.C1}, C2 = ${l.C2K} K at Tref (${l.equation})`
    : `Arrhenius, Ea = ${l.activationEnergyKJPerMol} kJ/mol (${l.equation})`;
}

function verticalText(t: DemoTruth): string {
  const v = t.verticalShift;
  return v.kind === 'density'
    ? `entropic, from density: ρref = ${v.referenceDensityKgPerM3} kg/m³ at Tref, ` +
        `αV = ${v.volumetricExpansionPerK} 1/K (${v.equation})`
    : 'none (bT = 1)';
}

const fix = (x: number, d: number): string => x.toFixed(d);

/** README.md of one scenario folder. */
export function demoScenarioReadme(s: DemoScenario, t: DemoTruth): string {
  const p = t.prony;
  const taus = p.modes.map((m) => m.tauS);
  const rows = t.isotherms.map(
    (i) =>
      `| ${i.setPointC} | ${fix(i.meanTemperatureC, 2)} | ${fix(i.spreadK, 2)} | ${i.points} | ` +
      `${fix(i.log10aT, 4)} | ${fix(i.log10bT, 4)} |`,
  );
  const flagged = t.isotherms.filter((i) => i.lowTorquePointIndices.length > 0);
  const lowTorque = t.noise.lowTorque
    ? ` A torque floor adds normal noise of SD ${t.noise.lowTorque.floorPa} Pa to every modulus; ` +
      `it exceeds ${t.noise.lowTorque.lowTorqueShare * 100} % of G′ (low torque) at ` +
      (flagged.length === 0
        ? 'no point.'
        : flagged
            .map((i) => `${i.lowTorquePointIndices.length} point(s) at ${i.setPointC} °C`)
            .join(', ') + '.')
    : '';
  const sci = (x: number): string =>
    x === 0 ? '0' : x < 1e-3 || x >= 1e4 ? x.toExponential(2) : x.toPrecision(3);
  return [
    `# ${s.product} — ${s.firm} (invented demo data)`,
    '',
    `**Everything in this folder is invented.** ${s.firm} and ${s.product} do not exist. The ` +
      `numbers were made by Thermoshift's seeded sample generator (\`scripts/generate-samples.ts\`, ` +
      `scenario \`${s.id}\`, seed ${s.seed}) from a known model, so you can see how well a master ` +
      'curve recovers it. They are not measurements and must not be used for design.',
    '',
    s.description,
    '',
    '## Files',
    '',
    ...t.files.map((f) => `- \`${f}\``),
    '- `truth.json`: the true model and the generator settings (see below).',
    '',
    layoutText(s),
    '',
    `Units in the files: temperature °C, ${s.testKind === 'relaxation' ? 'time' : 'frequency'} ` +
      `${s.xUnit}, moduli ${s.modulusUnit}.`,
    '',
    '## The true model',
    '',
    `- Test: ${s.testKind}, ${s.deformation}.`,
    `- Reference temperature: ${t.referenceTemperatureC} °C.`,
    `- Shift law: ${lawText(t)}. Conventions: ${t.conventions.horizontal}.`,
    `- Vertical shift: ${verticalText(t)}. Convention: ${t.conventions.vertical}.`,
    `- Prony series at Tref: ${p.modes.length} modes, τ from ${sci(taus[0])} to ` +
      `${sci(taus[taus.length - 1])} s, equilibrium modulus ${sci(p.equilibriumModulusPa)} Pa` +
      (p.zeroShearViscosityPaS === null
        ? '.'
        : `, zero-shear viscosity ${p.zeroShearViscosityPaS.toPrecision(4)} Pa·s.`),
    `- Noise: ${t.noise.relativeStdDev * 100} % multiplicative (log-normal) on every modulus.` +
      lowTorque,
    `- Temperatures: ${t.temperature.description}.`,
    '',
    '| set point (°C) | mean measured (°C) | spread (K) | points | true log10 aT | true log10 bT |',
    '| ---: | ---: | ---: | ---: | ---: | ---: |',
    ...rows,
    '',
    'The true shifts are evaluated at each isotherm’s mean measured temperature.',
    '',
    '## Regenerate',
    '',
    'Run `npm run samples` from the repository root. The generator is seeded, so the files come ' +
      'out byte for byte the same; a test checks this.',
    '',
    '## Cautions',
    '',
    'Demo data only. A master curve describes linear viscoelastic behaviour of a ' +
      'thermorheologically simple material; predictions outside the measured window of reduced ' +
      'frequency or time, or outside the measured temperatures, are extrapolations. Real design ' +
      'decisions need real measurements, confirmation by testing, and must follow the applicable ' +
      'codes and licensed engineering practice.',
    '',
  ].join('\n');
}

/** README.md of samples/: the list of scenarios. */
export function demoIndexReadme(scenarios: DemoScenario[]): string {
  return [
    '# Invented demo samples',
    '',
    '**All data in this folder is invented.** The firms, products and numbers do not exist; ' +
      'they were made by `scripts/generate-samples.ts` (run `npm run samples`) from known models ' +
      'with fixed seeds. Each folder holds the data files, a README and `truth.json` with the ' +
      'true parameters. See docs/samples.md.',
    '',
    '| folder | invented material | test | layout |',
    '| --- | --- | --- | --- |',
    ...scenarios.map(
      (s) =>
        `| \`${s.id}/\` | ${s.product} (${s.firm}) | ${s.testKind}, ${s.deformation} | ${s.layout} |`,
    ),
    '',
    '`workbooks/seal-dma.xlsx` holds the `seal-dma/` data once more as an .xlsx workbook, one ' +
      'sheet per isotherm (its truth is `seal-dma/truth.json`).',
    '',
    'Demo data only: not for design. Master curves need confirmation by testing and must follow ' +
      'the applicable codes and licensed engineering practice.',
    '',
  ].join('\n');
}
