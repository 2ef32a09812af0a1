import { readFileSync } from 'node:fs';
import { describe, it, expect } from 'vitest';
import { bandIndex, groupTemperatures } from '../../../core/io/grouping';
import { importFiles } from '../../../core/io';
import { sweepFileText } from '../../../core/synthetic';
import { inventedMelt } from '../shift/fixtures';

const c = (t: number) => t + 273.15;

describe('groupTemperatures()', () => {
  it('groupTemperatures() keeps wandering readings of one set point together', () => {
    const bands = groupTemperatures([39.8, 40.1, 40.3, 59.9, 60.2].map(c), 1);
    expect(bands).toHaveLength(2);
    expect(bands[0].maxK - bands[0].minK).toBeCloseTo(0.5, 12);
    expect(bands.every((b) => !b.cut)).toBe(true);
  });

  it('groupTemperatures() regroups a stepped multi-frequency ramp into one band per step', () => {
    const ramp = [-0.3, -0.08, 0.03, 0.22, 3.75, 3.93, 4.1, 4.31, 7.8, 8.0, 8.2, 8.3].map(c);
    const bands = groupTemperatures(ramp, 1);
    expect(bands).toHaveLength(3);
    expect(bandIndex(bands, c(4.1))).toBe(1);
    expect(bandIndex(bands, c(8.3))).toBe(2);
  });

  it('groupTemperatures() cuts a continuous ramp into bands no wider than the tolerance', () => {
    const ramp = Array.from({ length: 50 }, (_, i) => c(20 + 0.3 * i));
    const bands = groupTemperatures(ramp, 1);
    expect(bands.every((b) => b.cut && b.maxK - b.minK <= 1 + 1e-12)).toBe(true);
    expect(bands.length).toBeGreaterThan(10);
  });

  it('groupTemperatures() with tolerance 0 separates every distinct temperature', () => {
    expect(groupTemperatures([300, 300, 300.01], 0)).toHaveLength(2);
  });

  it('groupTemperatures() handles empty and single inputs', () => {
    expect(groupTemperatures([], 1)).toEqual([]);
    expect(groupTemperatures([300], 1)).toEqual([{ minK: 300, maxK: 300, cut: false }]);
  });
});

describe('groupPoints() through importFiles()', () => {
  // Invented melt measured as a lab exports it: complete sweeps one after another (core/synthetic).
  const sweeps = (temperaturesK: number[], wanderK: number) =>
    sweepFileText(inventedMelt({ temperaturesK, pointsPerDecade: 5, seed: 4 }).dataset, {
      wanderK,
      seed: 9,
    });

  it('groupPoints() keeps 200 complete sweeps 0.4 K apart separate with the default 1 K tolerance', () => {
    const temps = Array.from({ length: 200 }, (_, k) => c(190 + 0.4 * k));
    for (const wanderK of [0, 0.05]) {
      const r = importFiles([{ name: 'sweeps.csv', text: sweeps(temps, wanderK) }]);
      expect(r.groups, `wander ${wanderK} K`).toHaveLength(200);
      expect(r.groups.every((g) => g.points === 16)).toBe(true);
      r.groups.forEach((g, k) => expect(Math.abs(g.temperatureK - temps[k])).toBeLessThan(0.06));
      expect(r.grouping.separateSweeps).toBe(200);
      expect(r.grouping.description).toMatch(/200 kept apart as complete sweeps/);
    }
  });

  it('groupPoints() still joins a repeated sweep at one set point and readings that wander about it', () => {
    // Two sweeps at 190 °C (the second a repeat) and one at 190.4 °C, readings wandering ±0.2 K:
    // the repeat is not steadier than the wander, so it joins; 190.4 °C is not either.
    const r = importFiles([{ name: 'repeat.csv', text: sweeps([c(190), c(190), c(190.4)], 0.2) }]);
    expect(r.groups).toHaveLength(1);
    expect(r.grouping.separateSweeps).toBe(0);
    expect(r.warnings.some((w) => /same frequency/.test(w.message))).toBe(true);
  });

  it('groupPoints() keeps the columns of a wide table at close temperatures apart', () => {
    const text = "f (Hz)\tG' 40°C [Pa]\tG' 40.5°C [Pa]\n0.1\t10\t9\n1\t20\t18\n10\t40\t35\n";
    const r = importFiles([{ name: 'wide.tsv', text }]);
    expect(r.groups.map((g) => g.points)).toEqual([3, 3]);
    expect(r.grouping.separateSweeps).toBe(2);
  });

  it('groupPoints() leaves isotherms of the ramp sample as they were (16 steps of 4 K)', () => {
    const text = readFileSync('samples/ramp-dma/odm5-heating-ramp.txt', 'utf8');
    const r = importFiles([{ name: 'odm5-heating-ramp.txt', text }]);
    expect(r.groups).toHaveLength(16);
    expect(r.groups.every((g) => g.points === 4 && g.temperatureSpreadK < 1)).toBe(true);
  });
});

describe('importFiles() with many temperatures', () => {
  it('importFiles() forms 10,000 isotherms of 3 points each (30,000 rows)', () => {
    const lines = ["T (°C),f (Hz),G' (Pa),G'' (Pa)"];
    for (let i = 0; i < 10_000; i++)
      for (let k = 0; k < 3; k++)
        lines.push(`${(-10 + i * 0.01).toFixed(3)},${10 ** (k * 0.5 - 1)},${1e5 + k},${1e4 + k}`);
    const r = importFiles([{ name: 't10k.csv', text: lines.join('\n') }], {
      groupingToleranceK: 0.002,
    });
    expect(r.groups).toHaveLength(10_000);
    expect(r.groups.every((g) => g.points === 3)).toBe(true);
    expect(r.warnings).toEqual([]);
  });
});
