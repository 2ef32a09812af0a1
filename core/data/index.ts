export * from './types';
export * from './quantities';
