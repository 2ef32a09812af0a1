/**
 * A toy shift model, written as a new model's descriptor file would be (docs/architecture.md,
 * "Adding a shift model", shows this file): log10 aT = b·(T − Tr), one constant b in 1/K. It is
 * added through the registry alone (`registerShiftModel`); no other file names it.
 */
import {
  fitLinearShiftLaw,
  type ShiftLaw,
  type ShiftModelDescriptor,
} from '../../../../core/models';

const LINEAR_LAW: ShiftLaw = {
  kind: 'linear',
  parameters: [{ name: 'b', unit: '1/K' }],
  log10aT: (values, referenceK, temperatureK) => values[0] * (temperatureK - referenceK),
  gradient: (_values, referenceK, temperatureK) => [temperatureK - referenceK],
};

export const linearToyModel: ShiftModelDescriptor = {
  kind: 'linear',
  name: 'linear',
  title: 'Linear',
  law: LINEAR_LAW,
  parameters: [{ analysisKey: 'bPerK', summaryKey: 'b', unit: '1/K', interval: true }],
  physical: false,
  fit: (points, options) => fitLinearShiftLaw(LINEAR_LAW, points, options),
  formula: { text: 'log10 aT = b (T − Tr)', ascii: 'log10 aT = b (T - Tr)' },
  validityNote: 'the linear toy law holds only close to Tr',
  chart: {
    colour: '#2f6f3e',
    line: 'dashed',
    appColour: '#2f6f3e',
    appLine: 'dashed',
    residualMarker: 'ring',
  },
};
