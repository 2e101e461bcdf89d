import type { RunPageItem } from '@linkloom/shared';

/** A page of a run as lists and the page detail show it: the contract plus the ids the back end keeps. */
export interface PageItem extends RunPageItem {
  pageId: number;
  islandId: number | null;
}

export const PAGE_ITEM_COLUMNS = `page_id as "pageId", path, title, stationary_score as "stationaryScore", times_average as "timesAverage", rank,
  inbound_count as "inboundCount", outbound_count as "outboundCount", depth, reachable, orphan, dead_end as "deadEnd", deep,
  island_id is not null as island, island_id as "islandId", broken_link_count as "brokenLinkCount", word_count as "wordCount"`;

export function toPageItem(row: PageItem): PageItem {
  return { ...row, pageId: Number(row.pageId) };
}

/** The item without internal ids, for the API. */
export function publicPageItem({ pageId: _pageId, ...item }: PageItem) {
  return item;
}
