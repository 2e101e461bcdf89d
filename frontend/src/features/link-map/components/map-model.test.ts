import { describe, expect, it } from 'vitest';
import { edgeWidth, findNode, folderCrumbs, mapElements } from './map-model.js';
import type { LinkMap } from '@linkloom/shared';

const graph: LinkMap = {
  runId: 'r1',
  level: 'folders',
  folder: '',
  totalPages: 45,
  nodes: [
    { id: 'guides', label: 'guides', path: 'guides', size: 40, stationaryScore: 0.6, pageCount: 40, flags: [] },
    { id: 'archive', label: 'archive', path: 'archive', size: 5, stationaryScore: 0.1, pageCount: 5, flags: ['orphan'] },
  ],
  edges: [
    { source: 'guides', target: 'archive', weight: 1 },
    { source: 'archive', target: 'gone', weight: 3 },
  ],
};

describe('link map model', () => {
  it('drops edges to nodes that are not drawn and labels folders with their page count', () => {
    const elements = mapElements(graph);
    expect(elements.filter((e) => e.group === 'edges')).toHaveLength(1);
    expect(elements.find((e) => e.data.id === 'guides')?.data.label).toBe('guides (40)');
    // The higher-scored folder is drawn larger.
    const size = (id: string) => Number(elements.find((e) => e.data.id === id)?.data.size);
    expect(size('guides')).toBeGreaterThan(size('archive'));
  });

  it('widens edges with the link count on a log scale', () => {
    expect(edgeWidth(1, 1000)).toBe(1);
    expect(edgeWidth(1000, 1000)).toBe(6);
    expect(edgeWidth(31, 1000)).toBeLessThan(edgeWidth(1000, 1000) / 1.5);
  });

  it('builds the breadcrumb back up from a folder', () => {
    expect(folderCrumbs('guides/setup').map((c) => c.folder)).toEqual(['', 'guides', 'guides/setup']);
  });

  it('finds a node by part of its path, ignoring case', () => {
    expect(findNode(graph.nodes, 'ARCH')?.id).toBe('archive');
    expect(findNode(graph.nodes, 'nothing')).toBeNull();
  });
});
