import { Injectable } from '@nestjs/common';
import { pageFlags } from '@linkloom/shared';
import { notFound } from '../../../common/app-error.js';
import type { RunRow } from '../../../db/schema/index.js';
import { OnDemandSuggestionsService } from '../suggestions/on-demand-suggestions.service.js';
import { SuggestionsRepository } from '../suggestions/suggestions.repository.js';
import { distancesFrom, keepTopNodes } from './neighbourhood.js';
import { publicPageItem, type PageItem } from './page-item.js';
import { PageDetailRepository } from './page-detail.repository.js';

const NEIGHBOURHOOD_EDGE_CAP = 20_000;

/** One page of a run with its links, findings, suggestions, history and neighbourhood. */
@Injectable()
export class PageDetailService {
  constructor(
    private readonly repository: PageDetailRepository,
    private readonly mentions: SuggestionsRepository,
    private readonly suggestions: OnDemandSuggestionsService,
  ) {}

  async detail(run: RunRow, path: string) {
    const item = await this.repository.item(run.id, path);
    if (!item) throw notFound('A page with this path in the run');
    const facts = await this.repository.facts(item.pageId);
    const frontMatter = (facts.frontMatter ?? {}) as Record<string, unknown>;
    const names = [
      item.title,
      ...(Array.isArray(frontMatter.aliases) ? frontMatter.aliases.filter((a): a is string => typeof a === 'string') : []),
    ];
    const [inbound, outbound, brokenLinks, unlinkedMentions, scoreHistory, neighbourhood] = await Promise.all([
      this.repository.inbound(run.snapshotId, item.pageId),
      this.repository.outbound(run.snapshotId, item.pageId),
      this.repository.brokenLinks(run.snapshotId, item.pageId),
      this.mentions.unlinkedMentions(run.snapshotId, item.pageId, names, 20),
      this.repository.scoreHistory(run.docSetId, path),
      this.neighbourhood(run, item),
    ]);
    const needsLinks = item.orphan || !item.reachable || item.deep;
    const suggestedSources = needsLinks ? await this.suggestions.forPage(run, item.pageId) : [];
    return {
      ...publicPageItem(item),
      inbound,
      outbound,
      brokenLinks,
      anchors: facts.anchors ?? [],
      headings: facts.headings ?? [],
      frontMatter,
      unlinkedMentions: unlinkedMentions.map(({ path: p, title }) => ({ path: p, title })),
      suggestedSources,
      scoreHistory,
      neighbourhood,
    };
  }

  private async neighbourhood(run: RunRow, item: PageItem) {
    const first = await this.repository.edgesTouching(run.snapshotId, [item.pageId], NEIGHBOURHOOD_EDGE_CAP);
    const ring = [...new Set(first.flat())].filter((id) => id !== item.pageId);
    const second = ring.length > 0 ? await this.repository.edgesTouching(run.snapshotId, ring, NEIGHBOURHOOD_EDGE_CAP) : [];
    const distance = distancesFrom(item.pageId, first, second);
    const items = await this.repository.items(run.id, [...distance.keys()]);
    const byId = new Map(items.map((i) => [i.pageId, i]));
    const kept = keepTopNodes(item.pageId, new Map(items.map((i) => [i.pageId, i.stationaryScore])));
    const nodes = [...kept]
      .map((id) => byId.get(id)!)
      .filter(Boolean)
      .map((n) => ({
        path: n.path,
        title: n.title,
        stationaryScore: n.stationaryScore,
        flags: pageFlags(n),
        distance: distance.get(n.pageId)!,
      }));
    const seen = new Set<string>();
    const edges = [...first, ...second]
      .filter(([s, t]) => kept.has(s) && kept.has(t) && !seen.has(`${s}>${t}`) && seen.add(`${s}>${t}`))
      .map(([s, t]) => ({ source: byId.get(s)!.path, target: byId.get(t)!.path }));
    return { nodes, edges };
  }
}
