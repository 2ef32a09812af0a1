/** Thermoshift core: a pure TypeScript library (no DOM, no Node, no Electron). */
export * from './data';
