export * from './types';
export * from './quantities';
export * from './reduction';
export * from './extent';
export { formatCelsius } from './temperature';
export * from './derived';
export * from './conventions';
