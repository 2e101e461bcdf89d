// Pure reading of a page's neighbourhood (nodes up to two link steps away, with the edges between them):
// who links here, where this page links, and what lies two steps out. Used by the picture and its list.
import type { NeighbourNode, Neighbourhood } from '@linkloom/shared';
import { FOCUS_COLOUR, findingColour, nodeSize } from './finding-colours.js';

export interface NeighbourGroups {
  centre: NeighbourNode | null;
  /** Pages with a link to the centre page. */
  linksHere: NeighbourNode[];
  /** Pages the centre page links to. */
  linkedFromHere: NeighbourNode[];
  /** Pages two steps away, in either direction. */
  twoSteps: NeighbourNode[];
}

const byScore = (a: NeighbourNode, b: NeighbourNode) => b.stationaryScore - a.stationaryScore || a.path.localeCompare(b.path);

export function groupNeighbours(neighbourhood: Neighbourhood, centrePath: string): NeighbourGroups {
  const byPath = new Map(neighbourhood.nodes.map((n) => [n.path, n]));
  const inbound = new Set<string>();
  const outbound = new Set<string>();
  for (const { source, target } of neighbourhood.edges) {
    if (target === centrePath && source !== centrePath) inbound.add(source);
    if (source === centrePath && target !== centrePath) outbound.add(target);
  }
  const pick = (paths: Set<string>) =>
    [...paths]
      .map((p) => byPath.get(p))
      .filter((n): n is NeighbourNode => Boolean(n))
      .sort(byScore);
  const twoSteps = neighbourhood.nodes.filter((n) => n.path !== centrePath && !inbound.has(n.path) && !outbound.has(n.path)).sort(byScore);
  return { centre: byPath.get(centrePath) ?? null, linksHere: pick(inbound), linkedFromHere: pick(outbound), twoSteps };
}

export interface NeighbourElement {
  group: 'nodes' | 'edges';
  data: Record<string, string | number>;
}

/** Cytoscape elements: size by score, fill by finding; the centre page gets the brand ink. */
export function neighbourhoodElements(neighbourhood: Neighbourhood, centrePath: string): NeighbourElement[] {
  const maxScore = Math.max(0, ...neighbourhood.nodes.map((n) => n.stationaryScore));
  const known = new Set(neighbourhood.nodes.map((n) => n.path));
  const nodes: NeighbourElement[] = neighbourhood.nodes.map((n) => ({
    group: 'nodes',
    data: {
      id: n.path,
      label: shortLabel(n.title || n.path),
      distance: n.path === centrePath ? 0 : n.distance,
      size: nodeSize(n.stationaryScore, maxScore),
      colour: n.path === centrePath ? FOCUS_COLOUR : findingColour(n.flags),
    },
  }));
  const edges: NeighbourElement[] = neighbourhood.edges
    .filter((e) => known.has(e.source) && known.has(e.target) && e.source !== e.target)
    .map((e) => ({ group: 'edges', data: { id: `${e.source}→${e.target}`, source: e.source, target: e.target, width: 1.5 } }));
  return [...nodes, ...edges];
}

export function shortLabel(text: string, max = 28): string {
  return text.length > max ? `${text.slice(0, max - 1)}…` : text;
}
