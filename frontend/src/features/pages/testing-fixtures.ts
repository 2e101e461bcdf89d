// Invented pages of a fictional bicycle-repair co-op handbook, for the page screens' tests; typed from the
// shared schemas and parsed by them, so they look exactly like what the API client hands a screen.
import { pageDetailSchema, runPageItemSchema, type PageDetail, type RunPageItem } from '@linkloom/shared';
import { parsed } from '../../testing/fixtures.js';

export function pageRow(path: string, overrides: Partial<RunPageItem> = {}): RunPageItem {
  return parsed(runPageItemSchema, {
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
    islandId: null,
    brokenLinkCount: 0,
    wordCount: 420,
    ...overrides,
  });
}

export function pageDetail(path: string, overrides: Partial<PageDetail> = {}): PageDetail {
  return parsed(pageDetailSchema, {
    ...pageRow(path),
    inbound: [],
    outbound: [],
    brokenLinks: [],
    anchors: [],
    headings: [],
    frontMatter: {},
    unlinkedMentions: [],
    suggestedSources: [],
    scoreHistory: [],
    neighbourhood: { nodes: [], edges: [] },
    ...overrides,
  });
}
