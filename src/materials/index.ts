/** The built-in fluid catalogue and its resolver. */
export * from './types.js';
export * from './references.js';
export * from './water.js';
export * from './seawater.js';
export * from './catalogue.js';
export * from './resolve.js';
export * from './lookup.js';
