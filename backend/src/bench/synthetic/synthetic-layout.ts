/**
 * Where the pages of a synthetic doc set live and what they are called, computed from the page number alone
 * so the generator never needs the whole set in memory. Link targets follow a Zipf (power-law) rank
 * distribution, the shape of in-degree measured on the web (Broder et al., "Graph structure in the Web",
 * WWW 2000, section 2: in-degree exponent about 2.1, recalled from memory); here the rank density is 1/(rank+1), sampled by inverse
 * transform, and ranks are scattered over the pages by a multiplicative bijection.
 */
import { fnv1a, type Random } from '../../modules/demo/generator/prng.js';

export interface SyntheticOptions {
  seed: number;
  pages?: number;
  targetBytes?: number;
  linksPerPage?: number;
  changedFraction?: number;
  changeSeed?: number;
}
export type ResolvedOptions = Required<SyntheticOptions>;

export const SYNTHETIC_SITE = 'https://docs.synthetic.example';
export const SYNTHETIC_BASE_PATH = '/docs';
export const SYNTHETIC_SETTINGS = { entryPages: ['index.md'], basePath: SYNTHETIC_BASE_PATH, siteBaseUrls: [SYNTHETIC_SITE] };

export function resolveOptions(o: SyntheticOptions): ResolvedOptions {
  const pages = o.pages ?? 10_000;
  return {
    seed: o.seed,
    pages,
    targetBytes: o.targetBytes ?? pages * 5_400,
    linksPerPage: o.linksPerPage ?? 30,
    changedFraction: o.changedFraction ?? 0,
    changeSeed: o.changeSeed ?? 0,
  };
}

const AREAS = [
  'getting-started',
  'guides',
  'reference',
  'operations',
  'integrations',
  'security',
  'billing',
  'administration',
  'api',
  'troubleshooting',
  'release-notes',
  'tutorials',
];
const TOPICS = [
  'accounts',
  'projects',
  'storage',
  'networking',
  'alerts',
  'webhooks',
  'exports',
  'imports',
  'search',
  'permissions',
  'audit',
  'backups',
  'scheduling',
  'reports',
  'dashboards',
  'tokens',
  'quotas',
  'regions',
  'sync',
  'cli',
];
const VERBS = ['configure', 'enable', 'rotate', 'migrate', 'monitor', 'restore', 'limit', 'share', 'debug', 'automate'];
const NOUNS = [
  'retention',
  'keys',
  'workspaces',
  'pipelines',
  'snapshots',
  'members',
  'policies',
  'endpoints',
  'schedules',
  'limits',
  'events',
  'labels',
];
export const HEADINGS = ['Overview', 'Before you begin', 'Configuration', 'Examples', 'Limits', 'Troubleshooting', 'Next steps', 'Options'];

/** The page's file stem: readable words plus the page number, so every stem is unique (wiki links resolve). */
export function stemOf(i: number, seed: number): string {
  if (i === 0) return 'index';
  const h = fnv1a(`stem|${seed}|${i}`);
  return `${VERBS[h % VERBS.length]}-${NOUNS[(h >>> 8) % NOUNS.length]}-${i}`;
}

export function folderOf(i: number, seed: number): string {
  if (i === 0) return '';
  const h = fnv1a(`dir|${seed}|${i}`);
  const base = `${AREAS[h % AREAS.length]}/${TOPICS[(h >>> 8) % TOPICS.length]}`;
  return (h >>> 16) % 4 === 0 ? `${base}/advanced` : base;
}

export function pathOf(i: number, seed: number): string {
  const folder = folderOf(i, seed);
  return folder ? `${folder}/${stemOf(i, seed)}.md` : 'index.md';
}

export function titleOf(i: number, seed: number): string {
  if (i === 0) return 'Documentation home';
  const words = stemOf(i, seed).split('-');
  return `${words[0]!.charAt(0).toUpperCase()}${words[0]!.slice(1)} ${words[1]} (${words[2]})`;
}

/** Headings of page i: always three to five of HEADINGS, chosen from i alone, so anchors can be linked blind. */
export function headingsOf(i: number, seed: number): string[] {
  const h = fnv1a(`head|${seed}|${i}`);
  const count = 3 + (h % 3);
  return Array.from({ length: count }, (_, k) => HEADINGS[(h >>> (4 + k * 3)) % HEADINGS.length]!).filter((x, k, a) => a.indexOf(x) === k);
}

function gcd(a: number, b: number): number {
  return b === 0 ? a : gcd(b, a % b);
}

export function coprimeStride(n: number, start: number): number {
  let s = start;
  while (gcd(s, n) !== 1) s++;
  return s;
}

/** A page other than the home page, drawn with probability falling as 1/(rank+1). */
export function zipfTarget(random: Random, pages: number, stride: number): number {
  const n = pages - 1;
  const rank = Math.min(n - 1, Math.floor(Math.exp(random() * Math.log(n + 1))) - 1);
  return 1 + ((rank * stride) % n);
}
