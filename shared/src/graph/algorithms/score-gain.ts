/**
 * Score gain of a proposed link: the change of the target's stationary score when the link source->target
 * is added, recomputed rather than estimated.
 *
 * Method: the power iteration of stationary-score.ts (Langville and Meyer, "Deeper Inside PageRank", 2004),
 * warm-started from the current vector, which is the usual way to update PageRank after a small change
 * (Langville and Meyer discuss it in the same paper, in their section on updating the PageRank vector;
 * cited from memory). The new edge is handled
 * inside the iteration loop, so the CSR is built once and shared by every candidate in a batch.
 */
import { hasEdge, type LinkGraph } from '../build-graph.js';
import {
  normalised,
  powerIterate,
  prepareTransition,
  resolveSettings,
  type StationaryScoreOptions,
  type Transition,
} from './stationary-score.js';

export interface ScoreGain {
  readonly source: number;
  readonly target: number;
  /** New score of the target minus its current score. */
  readonly gain: number;
  readonly currentScore: number;
  readonly newScore: number;
  /** Power iterations needed after the warm start (0 when the link already exists). */
  readonly iterations: number;
  readonly residual: number;
}

/** Options of the stationary score; `start` is ignored (the warm start is always `currentScores`). */
export type ScoreGainOptions = Omit<StationaryScoreOptions, 'start'>;

/**
 * Gain of one proposed link. `currentScores` must be the converged vector of the same graph and settings;
 * a tolerance well below the gains you compare (the default 1e-10) keeps the difference meaningful.
 */
export function computeScoreGain(
  graph: LinkGraph,
  currentScores: ArrayLike<number>,
  source: number,
  target: number,
  options: ScoreGainOptions = {},
): ScoreGain {
  return computeScoreGainsForTarget(graph, currentScores, target, [source], options)[0];
}

/** Gains of linking each candidate source to one target, sharing the CSR and transition data. */
export function computeScoreGainsForTarget(
  graph: LinkGraph,
  currentScores: ArrayLike<number>,
  target: number,
  sources: ArrayLike<number>,
  options: ScoreGainOptions = {},
): ScoreGain[] {
  const n = graph.nodeCount;
  checkNode(target, n, 'target');
  const settings = resolveSettings(n, options);
  const start = normalised(currentScores, n, 'currentScores');
  let transition: Transition | undefined;
  const gains: ScoreGain[] = [];
  for (let i = 0; i < sources.length; i++) {
    const source = sources[i];
    checkNode(source, n, 'source');
    const currentScore = start[target];
    if (source === target || hasEdge(graph, source, target)) {
      // Self-links are not edges and an existing edge cannot be added twice: nothing changes.
      gains.push({ source, target, gain: 0, currentScore, newScore: currentScore, iterations: 0, residual: 0 });
      continue;
    }
    transition ??= prepareTransition(graph);
    const result = powerIterate(graph, transition, settings, start, { source, target });
    const newScore = result.scores[target];
    gains.push({
      source,
      target,
      gain: newScore - currentScore,
      currentScore,
      newScore,
      iterations: result.iterations,
      residual: result.residual,
    });
  }
  return gains;
}

function checkNode(node: number, n: number, name: string): void {
  if (!Number.isInteger(node) || node < 0 || node >= n) throw new RangeError(`${name} ${node} outside 0..${n - 1}`);
}
