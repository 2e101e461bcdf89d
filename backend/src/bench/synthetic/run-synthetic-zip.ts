/**
 * Hand-run CLI: writes the benchmark doc set as a zip and prints how long it took.
 *   npx tsx src/bench/synthetic/run-synthetic-zip.ts <out.zip> [pages=10000] [seed=1] [changedFraction=0] [changeSeed=0]
 */
import { writeSyntheticZip } from './write-synthetic-zip.js';

const [outFile, pages = '10000', seed = '1', changedFraction = '0', changeSeed = '0'] = process.argv.slice(2);
if (!outFile) {
  console.error('usage: run-synthetic-zip <out.zip> [pages] [seed] [changedFraction] [changeSeed]');
  process.exit(2);
}
const started = performance.now();
const summary = await writeSyntheticZip(
  {
    seed: Number(seed),
    pages: Number(pages),
    targetBytes: Number(pages) * 5_400,
    linksPerPage: 30,
    changedFraction: Number(changedFraction),
    changeSeed: Number(changeSeed),
  },
  outFile,
);
const seconds = (performance.now() - started) / 1000;
console.log(
  JSON.stringify({ ...summary, seconds: Number(seconds.toFixed(2)), peakRssMB: Math.round(process.memoryUsage().rss / 2 ** 20) }),
);
