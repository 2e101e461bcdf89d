// Initial JavaScript of the built front end: the scripts index.html loads plus the modules it preloads,
// gzipped as a server would send them. Target: under 300 KB. Prints a `BENCH {json}` line.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { gzipSync } from 'node:zlib';

const dist = fileURLToPath(new URL('../frontend/dist', import.meta.url));
const html = readFileSync(join(dist, 'index.html'), 'utf8');
const files = new Set();
for (const match of html.matchAll(/<script[^>]+src="([^"]+\.js)"/g)) files.add(match[1]);
for (const match of html.matchAll(/<link[^>]+rel="modulepreload"[^>]+href="([^"]+\.js)"/g)) files.add(match[1]);
let raw = 0;
let gzip = 0;
for (const file of files) {
  const bytes = readFileSync(join(dist, file.replace(/^\//, '')));
  raw += bytes.length;
  gzip += gzipSync(bytes, { level: 9 }).length;
}
const kb = (n) => Math.round(n / 102.4) / 10;
console.log(`Initial JavaScript: ${files.size} files, ${kb(raw)} KB raw, ${kb(gzip)} KB gzipped (target < 300 KB)`);
console.log(
  `BENCH ${JSON.stringify({ label: 'frontend-initial-js', files: files.size, rawBytes: raw, gzipBytes: gzip, targetGzipBytes: 300 * 1024, met: gzip < 300 * 1024 })}`,
);
