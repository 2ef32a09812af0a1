export type { UnitConversion, UnitDimension } from './types';
export type { UnitParse } from './parse-unit';
export {
  parseUnit,
  toStoredUnit,
  describeConversion,
  describeDimension,
  normaliseUnitText,
} from './parse-unit';
export { siUnitOf, unitsOf } from './unit-table';
export { parseTemperatureText } from './temperature';
export type { TemperatureReading } from './temperature';
export {
  MODULUS_UNITS,
  type ModulusUnit,
  modulusFactor,
  toOutputUnit,
  outputUnitLabel,
} from './output-units';
