import { describe, it, expect } from 'vitest';
import { detectDialect } from '../../../core/io/dialect';

describe('detectDialect()', () => {
  it('detectDialect() finds comma, semicolon, tab and spaces', () => {
    expect(detectDialect(['T,f,G', '1.5,2,3', '2,3,4'])).toMatchObject({
      delimiter: 'comma',
      columns: 3,
    });
    expect(detectDialect(['1.5;2;3', '2;3;4'])).toMatchObject({
      delimiter: 'semicolon',
      decimalComma: false,
    });
    expect(detectDialect(['1.5\t2\t3'])).toMatchObject({ delimiter: 'tab', columns: 3 });
    expect(detectDialect(['  1.5   2  3', '2 3 4'])).toMatchObject({
      delimiter: 'spaces',
      columns: 3,
    });
  });

  it('detectDialect() finds a decimal comma with semicolons, tabs or spaces', () => {
    expect(detectDialect(['1,5;2,3e5', '0,1;4'])).toMatchObject({
      delimiter: 'semicolon',
      decimalComma: true,
    });
    expect(detectDialect(['1,5\t2,5'])).toMatchObject({ delimiter: 'tab', decimalComma: true });
    expect(detectDialect(['1,5 2,5'])).toMatchObject({ delimiter: 'spaces', decimalComma: true });
  });

  it('detectDialect() prefers the decimal point when integers fit both', () => {
    expect(detectDialect(['40;1;100'])).toMatchObject({
      delimiter: 'semicolon',
      decimalComma: false,
    });
  });

  it('detectDialect() returns undefined without rows of two or more numbers', () => {
    expect(detectDialect([])).toBeUndefined();
    expect(detectDialect(['hello world', '42'])).toBeUndefined();
  });
});
