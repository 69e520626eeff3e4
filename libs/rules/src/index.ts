export * from './jars.js';
export * from './kitchen.js';
