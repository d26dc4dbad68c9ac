/** The air column: standard atmosphere, temperature profiles, hydrostatic pressure, resolution and the scenario medium. */
export * from './column.js';
export * from './us1976.js';
export * from './grid.js';
export * from './temperature-profile.js';
export * from './hydrostatic.js';
export * from './resolve.js';
export * from './medium.js';
export * from './surface-stability.js';
export * from './surface-thermo.js';
export * from './surface-cool-skin.js';
export * from './surface-flux-input.js';
export * from './surface-flux.js';
export * from './surface-profile.js';
export * from './surface-column.js';
