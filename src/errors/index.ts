export * from './error-catalogue.js';
export * from './coded-error.js';
export * from './format-error.js';
