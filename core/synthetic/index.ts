export * from './random';
export * from './isotherm-set';
