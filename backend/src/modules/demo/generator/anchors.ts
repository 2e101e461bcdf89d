/**
 * Heading anchors the way GitHub makes them (the behaviour of the `github-slugger` package: lower-case, drop
 * punctuation, spaces to hyphens, repeats get -1, -2 ...), plus explicit `{#id}` attributes. Our headings are
 * plain ASCII, so this small version is enough; the tests check it against github-slugger itself.
 */
const CUSTOM_ID = /\s*\{#([A-Za-z0-9_-]+)\}\s*$/;

export function headingText(line: string): string {
  return line
    .replace(/^#+\s+/, '')
    .replace(CUSTOM_ID, '')
    .trim();
}

export function customId(line: string): string | undefined {
  return CUSTOM_ID.exec(line)?.[1];
}

export function slugOf(text: string): string {
  return text
    .toLowerCase()
    .replace(/[^a-z0-9 _-]/g, '')
    .replace(/ /g, '-');
}

/** Anchors of a page: the H1 title, then the heading lines in order; custom ids replace the slug. */
export function pageAnchors(title: string, headingLines: readonly string[], htmlIds: readonly string[] = []): string[] {
  const seen = new Map<string, number>();
  const anchors: string[] = [];
  const slugUnique = (text: string) => {
    const base = slugOf(text);
    let slug = base;
    let n = seen.get(base) ?? 0;
    while (seen.has(slug)) slug = `${base}-${++n}`;
    seen.set(base, n);
    seen.set(slug, 0);
    return slug;
  };
  anchors.push(slugUnique(title));
  for (const line of headingLines) {
    const id = customId(line);
    anchors.push(id ?? slugUnique(headingText(line)));
  }
  return [...anchors, ...htmlIds];
}
