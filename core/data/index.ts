export * from './types';
export * from './quantities';
export * from './reduction';
