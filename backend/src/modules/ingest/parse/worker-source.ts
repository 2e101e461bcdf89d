/**
 * Where the parse worker's code lives. From `dist/` the compiled `parse-worker.js` sits beside this file.
 * Under vitest only the `.ts` source exists, so the worker boots tsx's loader (`tsImport`) and imports the
 * source through it: the same worker code runs in both. With neither, the pool parses in-process.
 */
import { existsSync } from 'node:fs';
import { createRequire } from 'node:module';
import { fileURLToPath, pathToFileURL } from 'node:url';

export type WorkerSource = { kind: 'file'; url: URL } | { kind: 'eval'; code: string } | { kind: 'in-process' };

export function findWorkerSource(): WorkerSource {
  const compiled = new URL('./parse-worker.js', import.meta.url);
  if (existsSync(fileURLToPath(compiled))) return { kind: 'file', url: compiled };
  const source = new URL('./parse-worker.ts', import.meta.url);
  const loader = resolveTsLoader();
  if (existsSync(fileURLToPath(source)) && loader) {
    const code = `import(${JSON.stringify(loader)}).then((api) => api.tsImport(${JSON.stringify(source.href)}, ${JSON.stringify(source.href)}))`;
    return { kind: 'eval', code };
  }
  return { kind: 'in-process' };
}

/** tsx's ESM API entry; its CommonJS twin cannot be imported from an ES module worker. */
function resolveTsLoader(): string | null {
  try {
    const manifest = createRequire(import.meta.url).resolve('tsx/package.json');
    const entry = new URL('./dist/esm/api/index.mjs', pathToFileURL(manifest));
    return existsSync(fileURLToPath(entry)) ? entry.href : null;
  } catch {
    return null;
  }
}
