/**
 * Counts what zlib really inflates while a test runs: wraps `zlib.createInflateRaw` (which yauzl calls per
 * deflated entry) and the `push` of each inflater it returns. Independent of the reader's own counter, so a
 * reader that forgot to stop would still show up here. Call `restore()` in `finally`/`afterEach`.
 */
import { createRequire } from 'node:module';
import type * as ZlibModule from 'node:zlib';

// The CommonJS exports object itself (the one yauzl's `require("zlib")` sees), not an ESM namespace view.
const zlib = createRequire(import.meta.url)('node:zlib') as typeof ZlibModule;

export interface InflationProbe {
  readonly inflaters: number;
  readonly bytes: number;
  restore(): void;
}

export function probeInflation(): InflationProbe {
  const original = zlib.createInflateRaw;
  const state = { inflaters: 0, bytes: 0 };
  const patched = (options?: ZlibModule.ZlibOptions): ZlibModule.InflateRaw => {
    const inflater = original.call(zlib, options);
    state.inflaters += 1;
    const push = inflater.push.bind(inflater);
    inflater.push = (chunk: unknown, encoding?: BufferEncoding): boolean => {
      if (Buffer.isBuffer(chunk)) state.bytes += chunk.length;
      return push(chunk, encoding);
    };
    return inflater;
  };
  // Node defines it non-writable but configurable, so it is redefined rather than assigned.
  Object.defineProperty(zlib, 'createInflateRaw', { value: patched, configurable: true, enumerable: true });
  return {
    get inflaters() {
      return state.inflaters;
    },
    get bytes() {
      return state.bytes;
    },
    restore() {
      Object.defineProperty(zlib, 'createInflateRaw', { value: original, configurable: true, enumerable: true });
    },
  };
}

/** Wall time and resident-set growth of one call, for the report (measured, not asserted). */
export async function measure<T>(
  run: () => Promise<T>,
): Promise<{ result: T | undefined; error: unknown; ms: number; rssDeltaMb: number }> {
  const rssBefore = process.memoryUsage().rss;
  const start = process.hrtime.bigint();
  let result: T | undefined;
  let error: unknown;
  try {
    result = await run();
  } catch (caught) {
    error = caught;
  }
  const ms = Number(process.hrtime.bigint() - start) / 1e6;
  return { result, error, ms, rssDeltaMb: (process.memoryUsage().rss - rssBefore) / 1024 / 1024 };
}
