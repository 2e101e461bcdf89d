/** Messages between the parse pool and its workers, and the layout of the shared progress cells. */
import type { ParseOptions, ParseOutcome } from './parse-page.js';

export interface WorkerData {
  progressBuffer: SharedArrayBuffer;
  /** Date.now() at pool start; times in the Int32 cells are milliseconds after it. */
  clockBase: number;
}

export interface BatchRequest {
  id: number;
  paths: string[];
  /** End offset of each page's bytes in `buffer` (pages are packed back to back). */
  ends: number[];
  buffer: ArrayBuffer;
  options: ParseOptions;
}

export interface BatchResult {
  id: number;
  outcomes: ParseOutcome[];
}

/** Int32 cells: the batch being parsed (0 = idle), the page index in it, when that page started. */
export const PROGRESS_BATCH = 0;
export const PROGRESS_PAGE = 1;
export const PROGRESS_STARTED = 2;
export const PROGRESS_CELLS = 3;
