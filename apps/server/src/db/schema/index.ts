export * from './kitchens.js';
export * from './users.js';
export * from './days.js';
export * from './after-canner.js';
