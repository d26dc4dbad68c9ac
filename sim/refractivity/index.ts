/** Refractive index of air: models, water-vapour helpers, shared types and the tabulated n(z). */
export * from './types.js';
export * from './index-table.js';
export * from './water-vapour.js';
export * from './ciddor.js';
export * from './edlen.js';
export * from './birch-downs.js';
export * from './radio.js';
export * from './models.js';
export * from './build-table.js';
