/**
 * graphology and graphology-metrics (the reference engine for tests and the benchmark) are CommonJS with
 * type declarations written for default-import interop; under "nodenext" TypeScript types a default import
 * of them as the module namespace, so they are loaded with require and given their declared types here.
 */
import { createRequire } from 'node:module';

const require = createRequire(import.meta.url);

export const ReferenceGraph = require('graphology') as typeof import('graphology').default;
export const referencePagerank =
  require('graphology-metrics/centrality/pagerank.js') as typeof import('graphology-metrics/centrality/pagerank.js').default;
