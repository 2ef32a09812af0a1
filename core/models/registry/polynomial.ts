/**
 * The empirical quadratic, log10 aT = a1 (T − Tr) + a2 (T − Tr)² (common practice with
 * dynamic-modulus master curves of asphalt mixtures): read only inside its fitted range.
 */
import { fitPolynomial } from '../fit-polynomial';
import { POLYNOMIAL_LAW } from '../shift-laws';
import type { PolynomialFit } from '../types';
import type { ShiftModelDescriptor } from './descriptor';

export const polynomialModel: ShiftModelDescriptor<PolynomialFit> = {
  kind: 'polynomial',
  name: 'polynomial',
  title: 'Polynomial',
  law: POLYNOMIAL_LAW,
  parameters: [
    { analysisKey: 'a1PerK', summaryKey: 'a1', unit: '1/K', interval: false },
    { analysisKey: 'a2PerK2', summaryKey: 'a2', unit: '1/K²', csvUnit: '1/K^2', interval: false },
  ],
  physical: false,
  fit: fitPolynomial,
  formula: {
    text: 'log10 aT = a1 (T − Tr) + a2 (T − Tr)²',
    ascii: 'log10 aT = a1 (T - Tr) + a2 (T - Tr)^2',
  },
  chart: {
    colour: '#5a3d8a',
    line: 'dashed',
    appColour: '#5d4f8f',
    appLine: 'dashed',
    residualMarker: 'disc',
  },
};
