/**
 * Resolves every raw link of a snapshot against that snapshot's own file list (one resolver per import,
 * docs/link-rules.md "How links resolve") and writes the links in batches with page ids of the same snapshot.
 */
import type { DocSetSettings } from '@linkloom/shared';
import { createLinkResolver, type PageTargetInfo } from '@linkloom/shared/links';
import type { ResolverPage } from './page-writer.js';
import type { LinkInsert, PageStoreRepository } from './storage/page-store.repository.js';

export interface LinkWriteDeps {
  store: PageStoreRepository;
  snapshotId: string;
  settings: DocSetSettings;
  batchRows: number;
  /** Throws when the import is over its time budget. */
  checkDeadline(): void;
}

export async function resolveAndWriteLinks(pages: Map<string, ResolverPage>, assetPaths: string[], deps: LinkWriteDeps): Promise<number> {
  const targets = new Map<string, PageTargetInfo>();
  for (const [path, page] of pages) targets.set(path, page.target);
  const resolver = createLinkResolver({ pagePaths: [...pages.keys()], assetPaths, pages: targets, settings: deps.settings });
  let batch: LinkInsert[] = [];
  let total = 0;
  // Sorted so the same archive always stores its links in the same order (ids are comparable across runs).
  for (const path of [...pages.keys()].sort()) {
    const page = pages.get(path)!;
    for (const raw of page.rawLinks) {
      const link = resolver.resolve(path, raw);
      const target = link.targetPath && !link.targetIsAsset ? pages.get(link.targetPath) : undefined;
      batch.push({
        source_page_id: page.id,
        line: link.line,
        column: link.column,
        href: link.href,
        kind: link.kind,
        status: link.status,
        target_page_id: target?.id ?? null,
        target_path: link.targetPath,
        target_is_asset: link.targetIsAsset,
        anchor: link.anchor,
        reason: link.reason,
        flags: link.flags,
      });
      if (batch.length >= deps.batchRows) {
        deps.checkDeadline();
        await deps.store.insertLinks(deps.snapshotId, batch);
        total += batch.length;
        batch = [];
      }
    }
  }
  await deps.store.insertLinks(deps.snapshotId, batch);
  return total + batch.length;
}
