// Invented pages of a fictional bicycle-repair co-op handbook, for the page screens' tests.
import type { PageDetail, PageRow } from './types.js';

export function pageRow(path: string, overrides: Partial<PageRow> = {}): PageRow {
  return {
    path,
    title: path.replace(/\.md$/, '').split('/').pop() ?? path,
    stationaryScore: 0.01,
    timesAverage: 1.2,
    rank: 10,
    inboundCount: 3,
    outboundCount: 2,
    depth: 2,
    reachable: true,
    orphan: false,
    deadEnd: false,
    deep: false,
    island: false,
    brokenLinkCount: 0,
    wordCount: 420,
    ...overrides,
  };
}

export function pageDetail(path: string, overrides: Partial<PageDetail> = {}): PageDetail {
  return {
    ...pageRow(path),
    inbound: [],
    outbound: [],
    brokenLinks: [],
    anchors: [],
    unlinkedMentions: [],
    suggestedSources: [],
    scoreHistory: [],
    frontMatter: {},
    headings: [],
    neighbourhood: { nodes: [], edges: [] },
    ...overrides,
  };
}
