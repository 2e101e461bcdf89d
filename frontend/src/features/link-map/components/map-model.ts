// Pure preparation of the link map: cytoscape elements (size by score, fill by finding, edge width by link
// count) and the folder breadcrumb. No React and no cytoscape here.
import { findingColour, nodeSize } from '../../pages/components/finding-colours.js';
import type { LinkMap, LinkMapNode } from '@linkloom/shared';

export interface MapElement {
  group: 'nodes' | 'edges';
  data: Record<string, string | number>;
}

/** Edge width in pixels; a log scale keeps one folder pair with thousands of links from drowning the rest. */
export function edgeWidth(weight: number, maxWeight: number): number {
  if (!(maxWeight > 1) || !(weight > 1)) return 1;
  return Math.round((1 + 5 * (Math.log(weight) / Math.log(maxWeight))) * 10) / 10;
}

export function nodeLabel(node: LinkMapNode): string {
  return node.pageCount != null ? `${node.label} (${node.pageCount})` : node.label;
}

export function mapElements(graph: LinkMap): MapElement[] {
  const maxScore = Math.max(0, ...graph.nodes.map((n) => n.stationaryScore));
  const maxWeight = Math.max(1, ...graph.edges.map((e) => e.weight));
  const ids = new Set(graph.nodes.map((n) => n.id));
  return [
    ...graph.nodes.map((n): MapElement => ({
      group: 'nodes',
      data: { id: n.id, label: nodeLabel(n), size: nodeSize(n.stationaryScore, maxScore, 14, 70), colour: findingColour(n.flags) },
    })),
    ...graph.edges
      .filter((e) => ids.has(e.source) && ids.has(e.target) && e.source !== e.target)
      .map((e): MapElement => ({
        group: 'edges',
        data: { id: `${e.source}→${e.target}`, source: e.source, target: e.target, width: edgeWidth(e.weight, maxWeight) },
      })),
  ];
}

export interface Crumb {
  label: string;
  folder: string;
}

/** `guides/setup` -> All pages / guides / setup, each leading to that folder. */
export function folderCrumbs(folder: string): Crumb[] {
  const parts = folder.split('/').filter(Boolean);
  return [{ label: 'All folders', folder: '' }, ...parts.map((part, i) => ({ label: part, folder: parts.slice(0, i + 1).join('/') }))];
}

/** The first node whose label or path holds the words, case-insensitive; null when none does. */
export function findNode(nodes: LinkMapNode[], words: string): LinkMapNode | null {
  const needle = words.trim().toLowerCase();
  if (!needle) return null;
  return nodes.find((n) => n.label.toLowerCase().includes(needle) || n.path.toLowerCase().includes(needle)) ?? null;
}
