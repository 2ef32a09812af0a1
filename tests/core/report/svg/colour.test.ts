import { describe, it, expect } from 'vitest';
import { rampColour, rampStops, temperatureColour } from '../../../../core/report/svg/colour';

describe('temperatureColour()', () => {
  it('temperatureColour() gives the cold end to the lowest and the hot end to the highest temperature', () => {
    expect(temperatureColour(300, 300, 400)).toBe(rampColour(0));
    expect(temperatureColour(400, 300, 400)).toBe(rampColour(1));
    expect(temperatureColour(300, 300, 400)).not.toBe(temperatureColour(400, 300, 400));
  });
  it('temperatureColour() clamps outside the range and copes with an empty range', () => {
    expect(temperatureColour(200, 300, 400)).toBe(rampColour(0));
    expect(temperatureColour(350, 350, 350)).toBe(rampColour(0.5));
  });
  it('rampColour() returns #rrggbb for any input, NaN included', () => {
    for (const t of [0, 0.33, 1, NaN, -1, 2]) expect(rampColour(t)).toMatch(/^#[0-9a-f]{6}$/);
  });
  it('rampStops() spans offsets 0 to 1', () => {
    const s = rampStops(5);
    expect(s.map((x) => x.offset)).toEqual([0, 0.25, 0.5, 0.75, 1]);
  });
});
