/**
 * Hand-run CLI: writes one version of the demo handbook to a folder, with its settings and expected findings
 * beside it (outside the doc set), for manual imports and for looking at the pages.
 *   npx tsx src/modules/demo/generator/write-demo-handbook.ts <version 1|2|3> <outDir>
 */
import { mkdirSync, writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { generateDemoHandbook } from './generate-demo-handbook.js';

const [versionArg, outDir] = process.argv.slice(2);
const version = Number(versionArg);
if (!outDir || ![1, 2, 3].includes(version)) {
  console.error('usage: write-demo-handbook <1|2|3> <outDir>');
  process.exit(2);
}
const { files, settings, expected } = generateDemoHandbook(version as 1 | 2 | 3);
for (const [path, content] of Object.entries(files)) {
  const target = join(outDir, 'handbook', path);
  mkdirSync(dirname(target), { recursive: true });
  writeFileSync(target, content);
}
writeFileSync(join(outDir, 'settings.json'), JSON.stringify(settings, null, 2));
writeFileSync(join(outDir, 'expected.json'), JSON.stringify(expected, null, 2));
console.log(`wrote ${Object.keys(files).length} files to ${join(outDir, 'handbook')}`);
