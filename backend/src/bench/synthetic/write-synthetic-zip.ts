import { createWriteStream } from 'node:fs';
import { once } from 'node:events';
import { Readable } from 'node:stream';
import { finished } from 'node:stream/promises';
import yazl from 'yazl';
import { generateSyntheticDocSet, type SyntheticFile } from './synthetic-doc-set.js';
import type { SyntheticOptions } from './synthetic-layout.js';

export interface SyntheticZipSummary {
  files: number;
  pages: number;
  links: number;
  uncompressedBytes: number;
  zipBytes: number;
}

// A fixed time stamp keeps the zip byte-for-byte the same for the same options.
const MTIME = new Date('2026-01-01T00:00:00Z');
// Pages generated ahead of the zip writer: enough to keep it busy, few enough that memory stays small.
const WINDOW = 64;

/**
 * Streams the synthetic doc set into a zip file. Each entry is handed to yazl as a stream and at most WINDOW pages
 * wait for yazl to consume them, so memory holds a few dozen pages, not the whole set.
 */
export async function writeSyntheticZip(options: SyntheticOptions, outFile: string): Promise<SyntheticZipSummary> {
  const zip = new yazl.ZipFile();
  const out = createWriteStream(outFile);
  zip.outputStream.pipe(out);
  const summary: SyntheticZipSummary = { files: 0, pages: 0, links: 0, uncompressedBytes: 0, zipBytes: 0 };
  const count = (f: SyntheticFile, size: number) => {
    summary.files++;
    summary.uncompressedBytes += size;
    summary.links += f.linkCount;
    if (f.path.endsWith('.md')) summary.pages++;
  };
  const pending: Array<Promise<void>> = [];
  for (const file of generateSyntheticDocSet(options)) {
    const data = Buffer.from(file.content, 'utf8');
    count(file, data.length);
    const input = Readable.from([data], { objectMode: false });
    zip.addReadStream(input, file.path, { mtime: MTIME, compress: true });
    pending.push(finished(input));
    if (pending.length >= WINDOW) await pending.shift();
  }
  await Promise.all(pending);
  zip.end();
  await once(out, 'close');
  summary.zipBytes = out.bytesWritten;
  return summary;
}
