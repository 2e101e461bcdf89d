import { Injectable } from '@nestjs/common';
import { existsSync } from 'node:fs';
import { createRequire } from 'node:module';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { Worker } from 'node:worker_threads';
import type { AnalyzeJob, AnalyzeJobResult, GainsJob, GainsJobResult } from './analysis-jobs.js';

/**
 * Runs analysis jobs in a fresh worker thread each (a run is seconds long, so the ~50 ms thread start does
 * not matter, and a crashed or leaking job cannot poison the next one).
 */
@Injectable()
export class AnalysisWorkerClient {
  analyze(job: AnalyzeJob): Promise<AnalyzeJobResult> {
    return runInWorker(job, []);
  }

  gains(job: GainsJob): Promise<GainsJobResult> {
    return runInWorker(job, []);
  }
}

type AnalysisJob = AnalyzeJob | GainsJob;

function runInWorker<T>(job: AnalysisJob, transfer: ArrayBuffer[]): Promise<T> {
  return new Promise<T>((resolve, reject) => {
    const worker = startWorker(job, transfer);
    let settled = false;
    worker.once('message', (result: T) => {
      settled = true;
      resolve(result);
    });
    worker.once('error', (error) => {
      settled = true;
      reject(error);
    });
    worker.once('exit', (code) => {
      if (!settled) reject(new Error(`The analysis worker stopped with exit code ${code} before answering.`));
    });
  });
}

/**
 * From dist/ the compiled .js sits next to this file. Under vitest the sources are TypeScript, which plain
 * Node 20 cannot run in a worker (and `--import tsx` in a worker's execArgv is not applied before the entry
 * loads on Node 20), so a one-line ES module bootstrap loads the .ts entry through tsx's `tsImport`
 * (test and development only; tsx is not needed in production).
 */
function startWorker(workerData: AnalysisJob, transferList: ArrayBuffer[]): Worker {
  const compiled = new URL('./analysis-worker.js', import.meta.url);
  if (existsSync(fileURLToPath(compiled))) return new Worker(compiled, { workerData, transferList });
  const entry = new URL('./analysis-worker.ts', import.meta.url).href;
  const tsxApi = pathToFileURL(
    createRequire(import.meta.url)
      .resolve('tsx/esm/api')
      .replace(/\.cjs$/, '.mjs'),
  ).href;
  const bootstrap = `import { tsImport } from ${JSON.stringify(tsxApi)}; await tsImport(${JSON.stringify(entry)}, ${JSON.stringify(entry)});`;
  return new Worker(new URL(`data:text/javascript,${encodeURIComponent(bootstrap)}`), { workerData, transferList });
}
