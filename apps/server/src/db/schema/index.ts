export * from './kitchens.js';
export * from './users.js';
