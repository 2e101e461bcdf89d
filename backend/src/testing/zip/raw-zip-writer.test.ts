/**
 * The hostile kit is only trustworthy if its well-formed output is a real ZIP: checked against yauzl with
 * its default options (the reference reader) and against yazl's CRCs for the same content.
 */
import yauzl from 'yauzl';
import { describe, expect, it } from 'vitest';
import { deflatedEntry, storedEntry, writeRawZip } from './raw-zip-writer.js';
import { wellFormedZip } from './well-formed-zip.js';

async function readAll(bytes: Buffer): Promise<Array<{ name: string; size: number; crc32: number; text: string }>> {
  const zip = await yauzl.fromBufferPromise(bytes, { lazyEntries: true });
  const out = [];
  for await (const entry of zip.eachEntry()) {
    const chunks: Buffer[] = [];
    for await (const chunk of await zip.openReadStreamPromise(entry)) chunks.push(chunk as Buffer);
    out.push({ name: entry.fileName, size: entry.uncompressedSize, crc32: entry.crc32, text: Buffer.concat(chunks).toString() });
  }
  return out;
}

describe('raw ZIP writer', () => {
  it('writes archives yauzl reads with default options, stored and deflated', async () => {
    const bytes = writeRawZip([storedEntry('a.md', '# A\n'), deflatedEntry('b/c.md', '# C\n'.repeat(30))]);
    const entries = await readAll(bytes);
    expect(entries.map((e) => [e.name, e.size, e.text])).toEqual([
      ['a.md', 4, '# A\n'],
      ['b/c.md', 120, '# C\n'.repeat(30)],
    ]);
  });

  it('writes ZIP64 records yauzl resolves (APPNOTE 4.3.14-4.3.15, 4.5.3)', async () => {
    const bytes = writeRawZip([deflatedEntry('z.md', '# Z\n', { zip64: true })], { zip64EndRecord: true });
    expect(bytes.readUInt32LE(bytes.length - 22 - 20 - 56)).toBe(0x06064b50);
    expect((await readAll(bytes)).map((e) => [e.name, e.text])).toEqual([['z.md', '# Z\n']]);
  });

  it('computes the same CRC-32 as yazl for the same content', async () => {
    const content = '# Same\n'.repeat(100);
    const fromYazl = await readAll(await wellFormedZip({ 's.md': content }));
    const fromRaw = await readAll(writeRawZip([deflatedEntry('s.md', content)]));
    expect(fromRaw[0].crc32).toBe(fromYazl[0].crc32);
  });
});
