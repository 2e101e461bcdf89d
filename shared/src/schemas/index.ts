export * from './roles.js';
export * from './doc-set-settings.js';
export * from './common.js';
export * from './users.js';
export * from './doc-sets.js';
export * from './runs.js';
export * from './work.js';
