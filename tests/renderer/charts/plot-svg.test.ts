import { describe, expect, it } from 'vitest';
import { plotToSvg } from '../../../app/renderer/src/charts/plot-svg';
import { measuredPlot } from '../../../app/renderer/src/charts/specs/measured-plot';
import { tinyDataset } from '../document/tiny-dataset';

describe('plotToSvg()', () => {
  it('plotToSvg() writes a standalone SVG of the plotted data with its axis labels', () => {
    const svg = plotToSvg(measuredPlot(tinyDataset(), {}));
    expect(svg.startsWith('<?xml')).toBe(true);
    expect(svg).toMatch(/<svg[^>]*xmlns="http:\/\/www\.w3\.org\/2000\/svg"/);
    expect(svg).toContain('<style>');
    expect(svg).toContain('frequency ω (rad/s)');
    expect(svg).toContain('Measured isotherms');
  });
});
