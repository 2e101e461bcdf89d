/**
 * One benchmark measurement, run inside its own child process so that peak RSS (getrusage maxrss) belongs
 * to that measurement alone and a reference engine that runs out of memory cannot take the run down.
 */
import { readFileSync } from 'node:fs';
import { endianness } from 'node:os';
import { ReferenceGraph, referencePagerank } from '../testing/graphology-reference.js';
import { buildGraphFromEdgePairs } from '../build-graph.js';
import { computeStationaryScore } from '../algorithms/stationary-score.js';
import { syntheticDocGraph, type SyntheticGraph } from './synthetic-graph.js';

export interface MeasureJob {
  readonly engine: 'linkloom' | 'graphology';
  readonly label: string;
  readonly nodes?: number;
  readonly edges?: number;
  readonly edgesFile?: string;
  readonly damping: number;
  readonly tolerances: readonly number[];
}

export interface Measurement {
  readonly label: string;
  readonly engine: string;
  readonly nodes: number;
  readonly edges: number;
  readonly distinctEdges: number | null;
  readonly tolerance: number;
  readonly buildMs: number;
  readonly scoreMs: number;
  /** CPU time (user + system) of the same phases: on a shared machine wall time also counts waiting. */
  readonly buildCpuMs: number;
  readonly scoreCpuMs: number;
  readonly iterations: number | null;
  readonly residual: number | null;
  readonly topScore: number;
  readonly rssMb: number;
}

export function loadInput(job: MeasureJob): SyntheticGraph {
  if (!job.edgesFile) return syntheticDocGraph(job.nodes!, job.edges!, 1);
  if (endianness() !== 'LE') throw new Error('--edges files are little-endian; this host is big-endian');
  const bytes = readFileSync(job.edgesFile);
  if (bytes.length % 8 !== 0) throw new Error(`${job.edgesFile}: length ${bytes.length} is not a multiple of 8 bytes`);
  const pairs = new Int32Array(bytes.buffer.slice(bytes.byteOffset, bytes.byteOffset + bytes.length));
  let max = -1;
  for (let i = 0; i < pairs.length; i++) if (pairs[i] > max) max = pairs[i];
  return { nodeCount: max + 1, pairs };
}

export function measure(job: MeasureJob): Measurement[] {
  const input = loadInput(job);
  (globalThis as { gc?: () => void }).gc?.();
  return job.engine === 'linkloom' ? measureLinkloom(job, input) : [measureGraphology(job, input)];
}

function measureLinkloom(job: MeasureJob, input: SyntheticGraph): Measurement[] {
  const t0 = performance.now();
  const c0 = cpuMs();
  const graph = buildGraphFromEdgePairs(input.nodeCount, input.pairs);
  const buildMs = performance.now() - t0;
  const buildCpuMs = cpuMs() - c0;
  return job.tolerances.map((tolerance) => {
    const t1 = performance.now();
    const c1 = cpuMs();
    const result = computeStationaryScore(graph, { damping: job.damping, tolerance });
    const scoreMs = performance.now() - t1;
    const scoreCpuMs = cpuMs() - c1;
    const common = {
      label: job.label,
      engine: 'linkloom',
      nodes: input.nodeCount,
      edges: input.pairs.length / 2,
      distinctEdges: graph.edgeCount,
    };
    return {
      ...common,
      tolerance,
      buildMs,
      scoreMs,
      buildCpuMs,
      scoreCpuMs,
      iterations: result.iterations,
      residual: result.residual,
      topScore: max(result.scores),
      rssMb: peakRssMb(),
    };
  });
}

/** Same computation with graphology: a simple directed graph (duplicates merged, no self-links). */
function measureGraphology(job: MeasureJob, input: SyntheticGraph): Measurement {
  const t0 = performance.now();
  const c0 = cpuMs();
  const graph = new ReferenceGraph({ type: 'directed', multi: false, allowSelfLoops: false });
  for (let u = 0; u < input.nodeCount; u++) graph.addNode(String(u));
  for (let e = 0; e < input.pairs.length; e += 2) {
    if (input.pairs[e] !== input.pairs[e + 1]) graph.mergeEdge(String(input.pairs[e]), String(input.pairs[e + 1]));
  }
  const buildMs = performance.now() - t0;
  const buildCpuMs = cpuMs() - c0;
  const tolerance = job.tolerances[0];
  const t1 = performance.now();
  const c1 = cpuMs();
  // graphology stops when the summed change is below N * tolerance: pass tolerance / N for our L1 rule.
  const scores = referencePagerank(graph, {
    alpha: job.damping,
    getEdgeWeight: null,
    tolerance: tolerance / input.nodeCount,
    maxIterations: 1000,
  });
  const scoreMs = performance.now() - t1;
  const scoreCpuMs = cpuMs() - c1;
  const top = Object.values(scores).reduce((a, b) => Math.max(a, b), 0);
  return {
    label: job.label,
    engine: 'graphology-metrics',
    nodes: input.nodeCount,
    edges: input.pairs.length / 2,
    distinctEdges: graph.size,
    tolerance,
    buildMs,
    scoreMs,
    buildCpuMs,
    scoreCpuMs,
    iterations: null,
    residual: null,
    topScore: top,
    rssMb: peakRssMb(),
  };
}

function max(values: Float64Array): number {
  let best = 0;
  for (let i = 0; i < values.length; i++) if (values[i] > best) best = values[i];
  return best;
}

function cpuMs(): number {
  const usage = process.cpuUsage();
  return (usage.user + usage.system) / 1000;
}

function peakRssMb(): number {
  return Math.round(process.resourceUsage().maxRSS / 1024);
}
