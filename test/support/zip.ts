import yazl from 'yazl';

/** A zip archive of the given text files, built in memory (yazl, the zip writer the tests use throughout). */
export function zipOf(files: Record<string, string>): Promise<Buffer> {
  const archive = new yazl.ZipFile();
  for (const [name, text] of Object.entries(files)) archive.addBuffer(Buffer.from(text), name);
  archive.end();
  const chunks: Buffer[] = [];
  return new Promise((resolve, reject) => {
    archive.outputStream
      .on('data', (c: Buffer) => chunks.push(c))
      .on('end', () => resolve(Buffer.concat(chunks)))
      .on('error', reject);
  });
}
