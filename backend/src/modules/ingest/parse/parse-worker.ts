/**
 * Worker-thread entry of the parse pool. Receives batches of pages packed into one transferred buffer,
 * answers one message per batch, and marks which page it is on in shared memory so the pool's watchdog
 * can tell a slow page from a slow batch without a message per page.
 */
import { parentPort, workerData } from 'node:worker_threads';
import { parsePageSafely, type ParseOutcome } from './parse-page.js';
import type { BatchRequest, BatchResult, WorkerData } from './parse-protocol.js';
import { PROGRESS_BATCH, PROGRESS_PAGE, PROGRESS_STARTED } from './parse-protocol.js';

const { progressBuffer, clockBase } = workerData as WorkerData;
const progress = new Int32Array(progressBuffer);

parentPort!.on('message', (request: BatchRequest) => {
  const bytes = new Uint8Array(request.buffer);
  const outcomes: ParseOutcome[] = [];
  let start = 0;
  for (let i = 0; i < request.paths.length; i += 1) {
    Atomics.store(progress, PROGRESS_PAGE, i);
    Atomics.store(progress, PROGRESS_STARTED, Date.now() - clockBase);
    Atomics.store(progress, PROGRESS_BATCH, request.id);
    const end = request.ends[i];
    outcomes.push(parsePageSafely(request.paths[i], bytes.subarray(start, end), request.options));
    start = end;
  }
  Atomics.store(progress, PROGRESS_BATCH, 0);
  const result: BatchResult = { id: request.id, outcomes };
  parentPort!.postMessage(result);
});
