import { FormControlLabel, Radio, RadioGroup, Typography } from '@mui/material';
import { Section, SwitchRow, TextRow, type FieldProps } from './settings-fields.js';

export function FilesSection(p: FieldProps) {
  return (
    <Section title="Which files are pages" intro="How Linkloom reads the archive or source folder.">
      <TextRow
        {...p}
        name="extensions"
        label="Page extensions"
        help="Files with these endings are pages, e.g. .md .mdx .markdown (space-separated)."
      />
      <TextRow
        {...p}
        name="indexFileNames"
        label="Index file names"
        multiline
        help="One per line. A link to a folder opens the first of these found in it."
      />
      <TextRow
        {...p}
        name="ignore"
        label="Ignore"
        multiline
        help="Glob patterns, one per line, e.g. drafts/** or **/_partials/*. Ignored files are neither pages nor link targets."
      />
      <SwitchRow
        {...p}
        name="stripTopFolder"
        label="Strip the archive's top folder"
        help="Zips made by right-click → compress wrap everything in one folder; drop it so paths start at the docs root."
      />
      <SwitchRow
        {...p}
        name="caseInsensitive"
        label="Links ignore letter case"
        help="Turn on if your site is served from a case-insensitive file system, where Guide.md and guide.md are the same page."
      />
      <SwitchRow
        {...p}
        name="wikiLinks"
        label="Read [[wiki links]]"
        help="Treat [[Page name]] as a link, as many wiki-style editors write them."
      />
      <TextRow
        {...p}
        name="sourceFolder"
        label="Server source folder"
        help="Optional: a folder on the Linkloom server to re-read instead of uploading a zip (admins set this up)."
      />
    </Section>
  );
}

export function LinksSection(p: FieldProps) {
  return (
    <Section title="How links resolve" intro="Where a link points depends on how your site is published.">
      <div>
        <Typography variant="body2" sx={{ fontWeight: 500 }}>
          Relative links start from
        </Typography>
        <RadioGroup row value={p.form.relativeTo} onChange={(e) => p.set({ relativeTo: e.target.value as 'file' | 'published-url' })}>
          <FormControlLabel value="file" control={<Radio />} label="the Markdown file" disabled={p.readOnly} />
          <FormControlLabel value="published-url" control={<Radio />} label="the published page URL" disabled={p.readOnly} />
        </RadioGroup>
        <Typography variant="caption" color="text.secondary">
          Pick “published page URL” if guide/setup.md is served as /guide/setup/ and links are written for that address.
        </Typography>
      </div>
      <TextRow
        {...p}
        name="siteBaseUrls"
        label="Site addresses"
        multiline
        help="One per line, e.g. https://docs.example.org. Absolute links to these count as internal links, not external ones."
      />
      <TextRow
        {...p}
        name="basePath"
        label="Base path"
        help="If the docs live under a sub-path such as /docs, enter it (starting with /)."
      />
      <TextRow {...p} name="localePrefix" label="Locale prefix" help="Optional, e.g. en: links like /en/guide are read as /guide." />
      <TextRow
        {...p}
        name="redirects"
        label="Redirects"
        multiline
        help="One per line: old/path.md -> new/path.md. Links to the old path count as redirected, not broken."
      />
    </Section>
  );
}

export function ScoringSection(p: FieldProps) {
  return (
    <Section
      title="How importance is scored"
      intro="Each page's stationary score models a reader clicking from page to page: the share of their time that lands on each page."
    >
      <TextRow
        {...p}
        name="damping"
        label="Damping factor"
        type="number"
        step={0.01}
        help="The chance a reader follows a link on the page rather than jumping somewhere else. 0.85 is the classic value; lower spreads importance more evenly."
      />
      <div>
        <Typography variant="body2" sx={{ fontWeight: 500 }}>
          When a reader jumps, they land on
        </Typography>
        <RadioGroup row value={p.form.teleport} onChange={(e) => p.set({ teleport: e.target.value as 'uniform' | 'entry-pages' })}>
          <FormControlLabel value="uniform" control={<Radio />} label="any page, equally likely" disabled={p.readOnly} />
          <FormControlLabel value="entry-pages" control={<Radio />} label="one of the entry pages" disabled={p.readOnly} />
        </RadioGroup>
      </div>
      <TextRow
        {...p}
        name="entryPages"
        label="Entry pages"
        multiline
        help="One path per line, e.g. index.md. Where readers start: depth and reachability are counted from here, and with “entry pages” above, jumps land here."
      />
      <TextRow
        {...p}
        name="depthThreshold"
        label="Depth threshold"
        type="number"
        step={1}
        help="Pages more clicks than this away from every entry page are flagged as deep."
      />
      <SwitchRow {...p} name="nightly" label="Analyse every night" help="Re-run the analysis nightly and send digests to subscribers." />
    </Section>
  );
}

export function PruningSection(p: FieldProps) {
  return (
    <Section title="Pruning thresholds" intro="Which pages are suggested for review as candidates to merge or retire.">
      <TextRow
        {...p}
        name="lowScorePercentile"
        label="Low score percentile"
        type="number"
        step={1}
        help="Pages in the lowest this-many percent by stationary score qualify (0–100)."
      />
      <TextRow
        {...p}
        name="staleDays"
        label="Stale after (days)"
        type="number"
        step={1}
        help="Pages not changed for this many days qualify."
      />
      <TextRow
        {...p}
        name="thinWordCount"
        label="Thin page word count"
        type="number"
        step={1}
        help="Pages with fewer words than this qualify."
      />
      <TextRow
        {...p}
        name="protectGlobs"
        label="Never suggest"
        multiline
        help="Glob patterns, one per line, for pages that must stay (legal notices, release notes)."
      />
    </Section>
  );
}
