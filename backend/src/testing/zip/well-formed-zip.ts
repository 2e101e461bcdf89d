/** Well-formed archives from yazl, the writer companion of yauzl: the reference for "a normal ZIP". */
import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import yazl from 'yazl';

export interface WellFormedOptions {
  /** Write ZIP64 records even for small entries (yazl `forceZip64Format`). */
  zip64?: boolean;
  /** Store instead of deflate. */
  store?: boolean;
}

export async function wellFormedZip(files: Record<string, string | Buffer>, options: WellFormedOptions = {}): Promise<Buffer> {
  const zip = new yazl.ZipFile();
  const fixedTime = new Date(Date.UTC(2024, 0, 1));
  for (const [name, content] of Object.entries(files)) {
    zip.addBuffer(Buffer.from(content), name, {
      mtime: fixedTime,
      compress: options.store !== true,
      forceZip64Format: options.zip64 === true,
    });
  }
  zip.end({ forceZip64Format: options.zip64 === true, comment: '' });
  const chunks: Buffer[] = [];
  for await (const chunk of zip.outputStream as AsyncIterable<Buffer>) chunks.push(chunk);
  return Buffer.concat(chunks);
}

/** A private temp folder for archives under test; `cleanup` removes it (hygiene check 25). */
export interface TempArchives {
  dir: string;
  write(name: string, bytes: Buffer): Promise<string>;
  cleanup(): Promise<void>;
}

export async function tempArchives(): Promise<TempArchives> {
  const dir = await mkdtemp(join(tmpdir(), 'linkloom-zip-'));
  return {
    dir,
    async write(name, bytes) {
      const file = join(dir, name);
      await writeFile(file, bytes, { mode: 0o600 });
      return file;
    },
    cleanup: () => rm(dir, { recursive: true, force: true }),
  };
}
