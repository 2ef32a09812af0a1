import { describe, it, expect } from 'vitest';
import { renderChart } from '../../../../core/report/svg/render-chart';
import type { ChartSpec } from '../../../../core/report/svg/chart-types';

const spec: ChartSpec = {
  id: 'c1',
  title: 'A <test> chart',
  width: 600,
  height: 360,
  x: { kind: 'log', label: 'ω (rad/s)' },
  y: { kind: 'log', label: "G' (Pa)" },
  series: [
    {
      name: 'a',
      x: [0.1, 1, 10],
      y: [1e3, 1e4, 1e5],
      colour: '#123456',
      line: 'solid',
      marker: 'disc',
    },
    { name: 'b', x: [1, 10], y: [0, 2e4], colour: '#654321', line: 'dashed', marker: 'ring' },
  ],
  bands: [{ name: 'band', x: [0.1, 10], lower: [1e3, 1e4], upper: [2e3, 2e4], colour: '#000' }],
  legend: [{ name: 'G′', colour: '#333', marker: 'disc', line: 'solid' }],
  colourBar: { minC: 40, maxC: 120 },
};

describe('renderChart()', () => {
  const svg = renderChart(spec);
  it('renderChart() returns one SVG element with a viewBox, so it scales to the page', () => {
    expect(svg.startsWith('<svg')).toBe(true);
    expect(svg.endsWith('</svg>')).toBe(true);
    expect(svg).toContain('viewBox="0 0 600 360"');
  });
  it('renderChart() draws one marker per drawable point and skips non-positive values on a log axis', () => {
    expect(svg.match(/class="pt"/g)).toHaveLength(4); // 3 + 1 (y = 0 cannot be drawn on a log axis)
  });
  it('renderChart() draws lines, the band and decade labels', () => {
    expect(svg.match(/class="series-line"/g)?.length).toBeGreaterThanOrEqual(2);
    expect(svg).toContain('class="band"');
    expect(svg).toContain('10⁴');
    expect(svg).toContain('stroke-dasharray');
  });
  it('renderChart() escapes text and states the colour-bar temperatures', () => {
    expect(svg).toContain('A &lt;test&gt; chart');
    expect(svg).toContain('120 °C');
    expect(svg).toContain('40 °C');
  });
  it('renderChart() draws error bars for series with yError', () => {
    const s = renderChart({
      ...spec,
      x: { kind: 'linear', label: 'T' },
      y: { kind: 'linear', label: 'log aT' },
      bands: [],
      series: [
        {
          name: 'e',
          x: [1, 2],
          y: [0, -1],
          yError: [0.1, null],
          colour: '#000',
          line: 'none',
          marker: 'disc',
        },
      ],
    });
    expect(s.match(/class="err"/g)).toHaveLength(1);
  });
  it('renderChart() renders an empty chart without failing', () => {
    const s = renderChart({ ...spec, series: [], bands: [], legend: [] });
    expect(s).toContain('<svg');
    expect(s).not.toContain('class="pt"');
  });
});

describe('renderChart() legend', () => {
  it('renderChart() wraps a long legend onto a second row instead of dropping entries', () => {
    const legend = Array.from({ length: 8 }, (_, i) => ({
      name: `a rather long legend entry ${i}`,
      colour: '#000',
      marker: 'disc' as const,
      line: 'none' as const,
    }));
    const s = renderChart({ ...spec, legend });
    for (let i = 0; i < 8; i++) expect(s).toContain(`a rather long legend entry ${i}`);
    expect(s).toMatch(/<text x="[\d.]+" y="32"/);
  });
});
