import { describe, expect, it } from 'vitest';
import { parsePredictQuery } from '../../app/cli/predict-query';
import { CliError } from '../../app/cli/cli-error';
import { EXIT } from '../../app/cli/exit-codes';
import { expectRelClose } from '../helpers/assert-close';

describe('parsePredictQuery()', () => {
  it('parsePredictQuery() reads a time query in years at a °C temperature', () => {
    const q = parsePredictQuery('relaxation@60C,10y');
    expect(q.quantity).toBe('relaxation');
    expectRelClose(q.temperatureK, 333.15, 1e-12, '60 °C in K');
    expectRelClose(q.timeS!, 10 * 365.25 * 86400, 1e-12, 'ten Julian years in s');
    expect(q.model).toBeUndefined();
  });

  it('parsePredictQuery() reads frequencies in Hz and rad/s, kelvin and a model', () => {
    const q = parsePredictQuery('storageModulus@463.15K,1Hz,Arrhenius');
    expect(q.quantity).toBe('storage');
    expectRelClose(q.temperatureK, 463.15, 1e-12, 'kelvin kept');
    expectRelClose(q.omegaRadPerS!, 2 * Math.PI, 1e-12, 'ω = 2πf');
    expect(q.model).toBe('arrhenius');
    expect(parsePredictQuery('loss@190,10rad/s').omegaRadPerS).toBe(10);
    expectRelClose(
      parsePredictQuery('tandelta@20C,5mHz').omegaRadPerS!,
      0.01 * Math.PI,
      1e-12,
      'mHz',
    );
    expect(parsePredictQuery('creep@23C,1000h').timeS).toBe(3.6e6);
  });

  it('parsePredictQuery() refuses bad queries with the usage exit code, naming what is wrong', () => {
    const bad: [string, RegExp][] = [
      ['relaxation60C,10y', /no QUANTITY@/],
      ['relaxation@60C', /a temperature and a time/],
      ['relaxation@warm,10y', /"warm" is not a temperature/],
      ['relaxation@60C,1Hz', /needs a positive time/],
      ['storage@60C,10y', /needs a positive frequency/],
      ['storage@60C,0Hz', /needs a positive frequency/],
      ['storage@60C,1Hz,spline', /unknown shift model "spline"/],
    ];
    for (const [text, why] of bad) {
      let err: unknown;
      try {
        parsePredictQuery(text);
      } catch (e) {
        err = e;
      }
      expect(err, text).toBeInstanceOf(CliError);
      expect((err as CliError).exitCode).toBe(EXIT.usage);
      expect((err as CliError).message).toMatch(why);
    }
  });
});
