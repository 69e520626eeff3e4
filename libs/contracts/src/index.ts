export * from './auth.js';
export * from './errors.js';
export * from './health.js';
export * from './kitchens.js';
export * from './recipes.js';
export * from './live.js';
export * from './days.js';
export * from './after-canner.js';
