/** A page of a run as lists and the page detail show it. */
export interface PageItem {
  pageId: number;
  path: string;
  title: string;
  stationaryScore: number;
  timesAverage: number;
  rank: number;
  inboundCount: number;
  outboundCount: number;
  depth: number | null;
  reachable: boolean;
  orphan: boolean;
  deadEnd: boolean;
  deep: boolean;
  island: boolean;
  islandId: number | null;
  brokenLinkCount: number;
  wordCount: number;
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
