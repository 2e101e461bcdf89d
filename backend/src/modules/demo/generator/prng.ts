/**
 * Seeded pseudo-random numbers: mulberry32 (Tommy Ettinger's 32-bit generator, public domain, 2017) and the
 * FNV-1a string hash (Fowler, Noll, Vo). Both are tiny and portable, so the same seed gives the same doc set
 * on every machine and Node version; Math.random() is never used.
 */
export type Random = () => number;

export function mulberry32(seed: number): Random {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export function fnv1a(text: string): number {
  let h = 0x811c9dc5;
  for (let i = 0; i < text.length; i++) {
    h ^= text.charCodeAt(i);
    h = Math.imul(h, 0x01000193);
  }
  return h >>> 0;
}

/** A generator seeded from a base seed and a label, so each page gets its own stable stream. */
export function randomFor(seed: number, label: string): Random {
  return mulberry32((seed ^ fnv1a(label)) >>> 0);
}

export function pick<T>(random: Random, items: readonly T[]): T {
  return items[Math.floor(random() * items.length)]!;
}

export function intBetween(random: Random, min: number, max: number): number {
  return min + Math.floor(random() * (max - min + 1));
}

/**
 * Rendezvous (highest-random-weight) choice of k items for a key: adding or removing candidates changes
 * few picks, so later versions of the handbook keep most of their cross-links and diffs stay readable.
 */
export function rendezvousPick(key: string, candidates: readonly string[], k: number): string[] {
  return candidates
    .map((c) => ({ c, w: fnv1a(`${key}|${c}`) }))
    .sort((x, y) => x.w - y.w || (x.c < y.c ? -1 : 1))
    .slice(0, k)
    .map((x) => x.c);
}
