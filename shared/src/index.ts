export * from './schemas/index.js';
