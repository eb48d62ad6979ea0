/** Zod-free helpers the browser may import: `@layerbook/contracts/engine`. */
export * from './settings';
export * from './assemble';
