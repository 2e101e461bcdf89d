/** Starting values of docs/threats.md, "Limits" for the import pipeline; tests and the benchmark may override them. */
export interface IngestLimits {
  parserThreads: number;
  pageTimeoutMs: number;
  importTimeoutMs: number;
  parserHeapMb: number;
  /** Pages per message to a parser thread, and the most bytes one message carries. */
  parseBatchPages: number;
  parseBatchBytes: number;
  /** Rows per INSERT statement (kept to a few MB each). */
  pageInsertBytes: number;
  linkInsertRows: number;
  /** Warnings kept on a snapshot; the rest are counted in one summary item. */
  maxStoredWarnings: number;
}

export const DEFAULT_INGEST_LIMITS: IngestLimits = Object.freeze({
  // The machine has 2 cores (STACK.md); more threads than cores only adds switching.
  parserThreads: 2,
  pageTimeoutMs: 2_000,
  importTimeoutMs: 120_000,
  parserHeapMb: 512,
  parseBatchPages: 64,
  parseBatchBytes: 1024 * 1024,
  pageInsertBytes: 2 * 1024 * 1024,
  linkInsertRows: 4_000,
  maxStoredWarnings: 1_000,
});

export const INGEST_LIMITS = Symbol('INGEST_LIMITS');
