/** The air column: standard atmosphere, temperature profiles, hydrostatic pressure, resolution and the scenario medium. */
export * from './column.js';
export * from './us1976.js';
export * from './grid.js';
export * from './temperature-profile.js';
export * from './hydrostatic.js';
export * from './resolve.js';
export * from './medium.js';
