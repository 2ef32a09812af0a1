/** Arrhenius: ln aT = (Ea/R)(1/T − 1/Tr), T in kelvin; one constant, Ea in kJ/mol. */
import { fitArrhenius } from '../fit-arrhenius';
import { ARRHENIUS_LAW } from '../shift-laws';
import type { ArrheniusFit } from '../types';
import type { ShiftModelDescriptor } from './descriptor';

export const arrheniusModel: ShiftModelDescriptor<ArrheniusFit> = {
  kind: 'arrhenius',
  name: 'Arrhenius',
  title: 'Arrhenius',
  law: ARRHENIUS_LAW,
  parameters: [
    {
      analysisKey: 'activationEnergyKJPerMol',
      summaryKey: 'activationEnergy',
      unit: 'kJ/mol',
      interval: true,
    },
  ],
  physical: true,
  fit: fitArrhenius,
  formula: {
    text: 'ln aT = (Ea/R)(1/T − 1/Tr), T in K',
    ascii: 'ln aT = (Ea/R)(1/T - 1/Tr), T in K',
  },
  chart: {
    colour: '#8a4f00',
    line: 'dashed',
    appColour: '#9a5b12',
    appLine: 'dashed',
    residualMarker: 'ring',
  },
};
