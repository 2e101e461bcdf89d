// Shape of the per-run graph route (link-map brief): pages, or one node per folder when the doc set is large.
export interface MapNode {
  id: string;
  label: string;
  path: string;
  size: number;
  stationaryScore: number;
  pageCount?: number;
  flags: string[];
}

export interface MapGraph {
  level: 'pages' | 'folders';
  nodes: MapNode[];
  edges: Array<{ source: string; target: string; weight: number }>;
}
