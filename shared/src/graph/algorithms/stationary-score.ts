/**
 * Stationary score (PageRank) by power iteration.
 *
 * Method: Brin and Page, "The Anatomy of a Large-Scale Hypertextual Web Search Engine", 1998, with the
 * dangling-node and teleport treatment of Langville and Meyer, "Deeper Inside PageRank", Internet
 * Mathematics 1(3), 2004, sections 3-5:  x = d * (P^T x + (dangling mass) * t) + (1 - d) * t,
 * P row-stochastic (1/outdegree per edge), t the teleport vector, dead-end pages handing their weight to t.
 * The product is done "pull" style over in-edges, with 1/outdegree precomputed, so each iteration is one
 * sequential sweep of the in-rows and no memory is allocated inside the loop.
 */
import type { LinkGraph } from '../build-graph.js';

export const STATIONARY_SCORE_DEFAULTS = { damping: 0.85, tolerance: 1e-10, maxIterations: 1000 } as const;

export interface StationaryScoreOptions {
  /** Damping factor d in (0, 1); default 0.85 (Brin and Page 1998). */
  readonly damping?: number;
  /** Teleport vector t (non-negative, any positive sum; normalised here). Default uniform. */
  readonly teleport?: ArrayLike<number>;
  /** Stop when the L1 change between iterations is below this; default 1e-10. */
  readonly tolerance?: number;
  readonly maxIterations?: number;
  /** Warm start (e.g. the previous run's vector); normalised here. Default: the teleport vector. */
  readonly start?: ArrayLike<number>;
}

export interface StationaryScoreResult {
  /** One score per page, summing to 1. */
  readonly scores: Float64Array;
  readonly iterations: number;
  /** L1 change of the last iteration. */
  readonly residual: number;
  readonly converged: boolean;
}

/** Transition data that depends only on the graph, shared by repeated runs (e.g. score-gain batches). */
export interface Transition {
  readonly invOutDegree: Float64Array;
  readonly danglingNodes: Int32Array;
}

export interface ResolvedSettings {
  readonly damping: number;
  readonly tolerance: number;
  readonly maxIterations: number;
  readonly teleport: Float64Array;
}

/** An edge that is not in the CSR but is handled inside the loop (a proposed link). */
export interface ExtraEdge {
  readonly source: number;
  readonly target: number;
}

export function computeStationaryScore(graph: LinkGraph, options: StationaryScoreOptions = {}): StationaryScoreResult {
  const settings = resolveSettings(graph.nodeCount, options);
  const start = options.start ? normalised(options.start, graph.nodeCount, 'start') : settings.teleport;
  return powerIterate(graph, prepareTransition(graph), settings, start);
}

export function prepareTransition(graph: LinkGraph): Transition {
  const n = graph.nodeCount;
  const invOutDegree = new Float64Array(n);
  let danglingCount = 0;
  for (let u = 0; u < n; u++) {
    const degree = graph.outOffsets[u + 1] - graph.outOffsets[u];
    if (degree === 0) danglingCount++;
    else invOutDegree[u] = 1 / degree;
  }
  const danglingNodes = new Int32Array(danglingCount);
  for (let u = 0, k = 0; u < n; u++) if (invOutDegree[u] === 0) danglingNodes[k++] = u;
  return { invOutDegree, danglingNodes };
}

export function resolveSettings(n: number, options: StationaryScoreOptions): ResolvedSettings {
  const damping = options.damping ?? STATIONARY_SCORE_DEFAULTS.damping;
  const tolerance = options.tolerance ?? STATIONARY_SCORE_DEFAULTS.tolerance;
  const maxIterations = options.maxIterations ?? STATIONARY_SCORE_DEFAULTS.maxIterations;
  if (!(damping > 0 && damping < 1)) throw new RangeError(`damping must be in (0, 1), got ${damping}`);
  if (!(tolerance > 0)) throw new RangeError(`tolerance must be positive, got ${tolerance}`);
  if (!Number.isInteger(maxIterations) || maxIterations < 1) throw new RangeError(`bad maxIterations: ${maxIterations}`);
  const teleport = options.teleport ? normalised(options.teleport, n, 'teleport') : new Float64Array(n).fill(1 / n);
  return { damping, tolerance, maxIterations, teleport };
}

/** Copies a non-negative vector and scales it to sum 1. */
export function normalised(vector: ArrayLike<number>, n: number, name: string): Float64Array {
  if (vector.length !== n) throw new RangeError(`${name} has length ${vector.length}, expected ${n}`);
  const copy = Float64Array.from(vector);
  let sum = 0;
  for (let i = 0; i < n; i++) {
    if (!(copy[i] >= 0) || !Number.isFinite(copy[i])) throw new RangeError(`${name}[${i}] must be finite and >= 0`);
    sum += copy[i];
  }
  if (n > 0 && !(sum > 0)) throw new RangeError(`${name} must have a positive sum`);
  for (let i = 0; i < n; i++) copy[i] /= sum;
  return copy;
}

/**
 * The power iteration itself. With `extra`, the edge extra.source->extra.target is treated as present
 * (source's out-degree + 1, no longer dangling) without rebuilding the CSR.
 */
export function powerIterate(
  graph: LinkGraph,
  transition: Transition,
  settings: ResolvedSettings,
  start: Float64Array,
  extra?: ExtraEdge,
): StationaryScoreResult {
  const n = graph.nodeCount;
  const { damping, tolerance, maxIterations, teleport } = settings;
  const { invOutDegree, danglingNodes } = transition;
  const uniform = teleport.every((value) => value === teleport[0]);
  const extraWasDangling = extra !== undefined && invOutDegree[extra.source] === 0;
  const extraInv = extra ? 1 / (graph.outOffsets[extra.source + 1] - graph.outOffsets[extra.source] + 1) : 0;
  let x = Float64Array.from(start);
  let next = new Float64Array(n);
  const share = new Float64Array(n);
  let residual = n === 0 ? 0 : Infinity;
  let iterations = 0;
  while (iterations < maxIterations && residual >= tolerance) {
    let danglingMass = sharesAndDanglingMass(x, invOutDegree, danglingNodes, damping, share);
    if (extra) {
      if (extraWasDangling) danglingMass -= x[extra.source];
      share[extra.source] = damping * x[extra.source] * extraInv;
    }
    const teleportWeight = damping * danglingMass + (1 - damping);
    residual = uniform
      ? pullUniform(graph.inOffsets, graph.inSources, share, teleportWeight * teleport[0], x, next)
      : pullWeighted(graph.inOffsets, graph.inSources, share, teleportWeight, teleport, x, next);
    if (extra) residual += addExtraShare(x, next, extra.target, share[extra.source]);
    const previous = x;
    x = next;
    next = previous;
    iterations++;
  }
  return { scores: x, iterations, residual, converged: residual < tolerance };
}

// The kernels below are small, monomorphic functions over typed arrays so the engine compiles them tightly;
// the uniform case reads one number instead of a teleport array.

/** share[u] = d * x[u] / outdegree(u); returns the weight held by dead-end pages. */
function sharesAndDanglingMass(x: Float64Array, invOut: Float64Array, dangling: Int32Array, damping: number, share: Float64Array): number {
  for (let u = 0; u < x.length; u++) share[u] = damping * x[u] * invOut[u];
  let mass = 0;
  for (let k = 0; k < dangling.length; k++) mass += x[dangling[k]];
  return mass;
}

/** next = P^T-pull of share + base; returns the L1 change |next - x|. */
function pullUniform(
  inOffsets: Int32Array,
  inSources: Int32Array,
  share: Float64Array,
  base: number,
  x: Float64Array,
  next: Float64Array,
): number {
  let residual = 0;
  for (let v = 0; v < x.length; v++) {
    let sum = base;
    for (let j = inOffsets[v], end = inOffsets[v + 1]; j < end; j++) sum += share[inSources[j]];
    next[v] = sum;
    residual += Math.abs(sum - x[v]);
  }
  return residual;
}

function pullWeighted(
  inOffsets: Int32Array,
  inSources: Int32Array,
  share: Float64Array,
  weight: number,
  teleport: Float64Array,
  x: Float64Array,
  next: Float64Array,
): number {
  let residual = 0;
  for (let v = 0; v < x.length; v++) {
    let sum = weight * teleport[v];
    for (let j = inOffsets[v], end = inOffsets[v + 1]; j < end; j++) sum += share[inSources[j]];
    next[v] = sum;
    residual += Math.abs(sum - x[v]);
  }
  return residual;
}

/** Adds the proposed edge's share to its target; returns the resulting change of the residual. */
function addExtraShare(x: Float64Array, next: Float64Array, target: number, extraShare: number): number {
  const before = Math.abs(next[target] - x[target]);
  next[target] += extraShare;
  return Math.abs(next[target] - x[target]) - before;
}
