import type { AbscissaKind, DeformationMode, QuantityId } from './types';

/** Symbol of a quantity as users write it, which depends on the deformation mode (G vs E, J vs D). */
export function quantitySymbol(q: QuantityId, mode: DeformationMode): string {
  const m = mode === 'shear' ? 'G' : 'E';
  switch (q) {
    case 'storageModulus':
      return `${m}'`;
    case 'lossModulus':
      return `${m}''`;
    case 'tanDelta':
      return 'tan δ';
    case 'phaseAngle':
      return 'δ';
    case 'complexModulus':
      return `|${m}*|`;
    case 'complexViscosity':
      return '|η*|';
    case 'relaxationModulus':
      return `${m}(t)`;
    case 'creepCompliance':
      return mode === 'shear' ? 'J(t)' : 'D(t)';
  }
}

/** SI unit a quantity is stored in. */
export function quantityUnit(q: QuantityId): string {
  switch (q) {
    case 'storageModulus':
    case 'lossModulus':
    case 'complexModulus':
    case 'relaxationModulus':
      return 'Pa';
    case 'complexViscosity':
      return 'Pa·s';
    case 'creepCompliance':
      return '1/Pa';
    case 'phaseAngle':
      return '°';
    case 'tanDelta':
      return '';
  }
}

export function abscissaLabel(kind: AbscissaKind): string {
  return kind === 'angularFrequency' ? 'ω (rad/s)' : 't (s)';
}

// K ↔ °C and temperature text: core/data/temperature.ts (re-exported here for the callers).
export { ZERO_CELSIUS_K, celsiusToKelvin, kelvinToCelsius } from './temperature';
