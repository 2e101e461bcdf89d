// Linkloom's own colours for findings, shared by chips, the neighbourhood picture and the link map.
// Chosen from the brand palette's neighbours (src/lib/theme.ts) and spaced in hue and lightness so the
// legend still reads for the common red-green colour-vision deficiencies; shape (border) backs up colour.
import { type PageFlag } from '@linkloom/shared';

export interface FlagStyle {
  label: string;
  colour: string;
  /** One sentence for the legend. */
  meaning: string;
}

export const FLAG_STYLES: Record<PageFlag, FlagStyle> = {
  orphan: { label: 'Orphan', colour: '#C2571A', meaning: 'No other page links here.' },
  'dead-end': { label: 'Dead end', colour: '#7A4FA3', meaning: 'Links to no other page.' },
  unreachable: { label: 'Unreachable', colour: '#A8324A', meaning: 'Cannot be reached by clicking from an entry page.' },
  deep: { label: 'Deep', colour: '#B8901C', meaning: 'More clicks from an entry page than the threshold.' },
  island: { label: 'Island', colour: '#2F6FA8', meaning: 'In a group of pages cut off from the rest.' },
};

/** Pages with no finding, and the page a picture is centred on. */
export const HEALTHY_COLOUR = '#4F9A8A';
export const FOCUS_COLOUR = '#123F4A';

/** Which flag wins the fill when a page has several: the one that hides the page most. */
const PRIORITY: PageFlag[] = ['unreachable', 'island', 'orphan', 'dead-end', 'deep'];

export function normaliseFlag(flag: string): PageFlag | null {
  const key = flag.replace(/[A-Z]/g, (c) => `-${c.toLowerCase()}`);
  return key in FLAG_STYLES ? (key as PageFlag) : null;
}

export function findingColour(flags: readonly string[]): string {
  const known = new Set(flags.map(normaliseFlag));
  const first = PRIORITY.find((f) => known.has(f));
  return first ? FLAG_STYLES[first].colour : HEALTHY_COLOUR;
}

/** Node diameter in pixels: area grows with the score's square root so one hub does not swallow the picture. */
export function nodeSize(score: number, maxScore: number, min = 18, max = 64): number {
  if (!(maxScore > 0) || !(score > 0)) return min;
  return Math.round(min + (max - min) * Math.sqrt(Math.min(1, score / maxScore)));
}
