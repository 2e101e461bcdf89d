// One file per aggregate; every table of the product is exported here for Drizzle and drizzle-kit.
export * from './users.js';
export * from './audit-log.js';
export * from './doc-sets.js';
export * from './snapshots.js';
export * from './runs.js';
export * from './mail.js';
export * from './notifications.js';
export * from './work.js';
export * from './api-tokens.js';
