// Shape of the per-run search route (API.md "Runs", extended by the search brief).
export type SearchMode = 'blend' | 'subgraph';

export interface SearchHit {
  path: string;
  title: string;
  /** Text around the matches; the server wraps each match in MATCH_OPEN ... MATCH_CLOSE. */
  snippet: string;
  textRank: number;
  stationaryScore: number;
  score: number;
  /** One line on why the hit ranks where it does. */
  why: string;
}

export interface SearchResult {
  items: SearchHit[];
  explanation: string;
  total: number;
}
