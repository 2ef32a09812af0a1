import { describe, it, expect } from 'vitest';
import {
  deformationFromMetadata,
  nameFromMetadata,
  parseMetadataLine,
  quantityFromMetadata,
  temperatureFromMetadata,
} from '../../../core/io/metadata';
import { expectAbsClose } from '../../helpers/assert-close';

describe('parseMetadataLine()', () => {
  it('parseMetadataLine() reads "# key: value", "key = value", "key: value" and "key;value"', () => {
    expect(parseMetadataLine('# temperature: 40 °C', 'comma')).toEqual({
      key: 'temperature',
      value: '40 °C',
    });
    expect(parseMetadataLine('T = 313.15 K', 'comma')).toEqual({ key: 'T', value: '313.15 K' });
    expect(parseMetadataLine('Operator: A. N. Other', 'tab')).toEqual({
      key: 'Operator',
      value: 'A. N. Other',
    });
    expect(parseMetadataLine('Start: 12:30:00', 'comma')).toEqual({
      key: 'Start',
      value: '12:30:00',
    });
    expect(parseMetadataLine('Sample name;PP-7;;', 'semicolon')).toEqual({
      key: 'Sample name',
      value: 'PP-7',
    });
    expect(parseMetadataLine('% name = "X"', 'comma')).toEqual({ key: 'name', value: 'X' });
  });

  it('parseMetadataLine() ignores lines that are no key and value', () => {
    expect(parseMetadataLine('# invented data only', 'comma')).toBeUndefined();
    expect(parseMetadataLine('x'.repeat(2000) + ': y', 'comma')).toBeUndefined();
  });
});

describe('temperatureFromMetadata()', () => {
  it('temperatureFromMetadata() reads the temperature keys labs use', () => {
    const cases: [Record<string, string>, number][] = [
      [{ temperature: '40 °C' }, 313.15],
      [{ T: '313.15 K' }, 313.15],
      [{ 'Temperature (°C)': '40' }, 313.15],
      [{ 'Set temperature': '-20 C' }, 253.15],
      [{ Temp: '104 °F' }, 313.15],
    ];
    for (const [meta, kelvin] of cases) {
      expectAbsClose(
        temperatureFromMetadata(meta)!.reading.temperatureK,
        kelvin,
        1e-9,
        JSON.stringify(meta),
      );
    }
  });

  it('temperatureFromMetadata() ignores other keys, lower-case t (time) and non-temperatures', () => {
    expect(temperatureFromMetadata({ temperatures: '150 to 230 °C' })).toBeUndefined();
    expect(temperatureFromMetadata({ t: '40 C' })).toBeUndefined();
    expect(temperatureFromMetadata({ temperature: 'room' })).toBeUndefined();
  });
});

describe('deformationFromMetadata()', () => {
  it('deformationFromMetadata() reads the instrument or mode', () => {
    expect(deformationFromMetadata({ instrument: 'DMA, tension clamp' })).toBe('tension');
    expect(deformationFromMetadata({ geometry: 'parallel plate 25 mm' })).toBe('shear');
    expect(deformationFromMetadata({ note: 'tension' })).toBeUndefined();
  });
});

describe('nameFromMetadata() and quantityFromMetadata()', () => {
  it('nameFromMetadata() and quantityFromMetadata() find their keys', () => {
    expect(nameFromMetadata({ operator: 'x', Sample: 'PP-7' })).toBe('PP-7');
    expect(quantityFromMetadata({ quantity: "E' [MPa]" })).toBe("E' [MPa]");
    expect(nameFromMetadata({})).toBeUndefined();
  });
});
