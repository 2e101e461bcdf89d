export { generateDemoHandbook, renderHandbook, DEMO_SETTINGS } from './generate-demo-handbook.js';
export type { DemoDocSet, ExpectedFindings, LinkFinding } from './types.js';
export type { HandbookVersion } from './versions.js';
