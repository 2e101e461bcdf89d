/**
 * Worker-thread entry of a run's computation: receives one job, answers with its result, then exits.
 * A separate thread keeps the API answering while a 100,000-page graph is analysed.
 */
import { parentPort, workerData } from 'node:worker_threads';
import { runAnalyzeJob, runGainsJob, type AnalyzeJob, type GainsJob } from './analysis-jobs.js';

const job = workerData as AnalyzeJob | GainsJob;
const result = job.kind === 'analyze' ? runAnalyzeJob(job) : runGainsJob(job);
const transfer =
  job.kind === 'analyze' ? Object.values(result).flatMap((v) => (ArrayBuffer.isView(v) ? [v.buffer as ArrayBuffer] : [])) : [];
parentPort!.postMessage(result, transfer);
