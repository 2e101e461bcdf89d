import { Injectable } from '@nestjs/common';
import { pageFlags } from '@linkloom/shared';
import type { AuthUser } from '../../common/auth.decorators.js';
import { RunsService } from '../runs/runs.service.js';
import { LinkMapRepository } from './link-map.repository.js';

export interface MapQuery {
  folder: string;
  folderDepth: number;
  limit: number;
}

/**
 * The link map: the pages themselves while they fit on one picture, else one node per folder with edges
 * weighted by the number of links between folders, so a 100,000-page doc set stays readable and fast.
 */
@Injectable()
export class LinkMapService {
  constructor(
    private readonly runs: RunsService,
    private readonly repository: LinkMapRepository,
  ) {}

  async graph(actor: AuthUser, docSetId: string, runId: string, query: MapQuery) {
    const run = await this.runs.resolve(actor, docSetId, runId);
    const prefix = query.folder ? `${query.folder.replace(/\/+$/, '')}/` : '';
    const total = await this.repository.countPages(run.id, prefix);
    if (total <= query.limit) {
      const pages = await this.repository.topPages(run.id, prefix, query.limit);
      const byId = new Map(pages.map((p) => [p.pageId, p.path]));
      const edges = await this.repository.edgesAmong(
        run.snapshotId,
        pages.map((p) => p.pageId),
      );
      return {
        runId: run.id,
        level: 'pages' as const,
        folder: query.folder,
        totalPages: total,
        nodes: pages.map((p) => ({
          id: p.path,
          label: p.title,
          path: p.path,
          size: p.stationaryScore,
          stationaryScore: p.stationaryScore,
          flags: pageFlags(p),
        })),
        edges: edges.map((e) => ({ source: byId.get(e.source)!, target: byId.get(e.target)!, weight: e.weight })),
      };
    }
    const groups = await this.repository.folderGroups(run.id, prefix, query.folderDepth);
    const nodeId = (key: string) => (key === '' ? `${prefix}(pages here)` : `${prefix}${key}/`);
    const edges = await this.repository.folderEdges(run.id, run.snapshotId, prefix, query.folderDepth, 2_000);
    return {
      runId: run.id,
      level: 'folders' as const,
      folder: query.folder,
      totalPages: total,
      nodes: groups.map((g) => ({
        id: nodeId(g.key),
        label: g.key === '' ? `${prefix || '/'} (pages directly here)` : g.key,
        path: g.key === '' ? prefix : `${prefix}${g.key}`,
        size: Number(g.stationaryScore),
        stationaryScore: Number(g.stationaryScore),
        pageCount: g.pageCount,
        flags: [g.orphans && 'orphan', g.deadEnds && 'dead-end', g.unreachable && 'unreachable', g.deep && 'deep'].filter(
          Boolean,
        ) as string[],
        findingCounts: { orphans: g.orphans, deadEnds: g.deadEnds, unreachable: g.unreachable, deep: g.deep },
      })),
      edges: edges.map((e) => ({ source: nodeId(e.source), target: nodeId(e.target), weight: e.weight })),
    };
  }
}
