import { mulberry32, fnv1a, pick, type Random } from '../../modules/demo/generator/prng.js';
import { relativePath } from '../../modules/demo/generator/link-syntax.js';
import { codeBlock, sentence } from './synthetic-text.js';
import {
  coprimeStride,
  folderOf,
  headingsOf,
  pathOf,
  stemOf,
  SYNTHETIC_BASE_PATH,
  titleOf,
  zipfTarget,
  type ResolvedOptions,
} from './synthetic-layout.js';

export const ASSET_COUNT = 40;
const EXTERNAL = [
  'https://status.cloud-vendor.example/incidents',
  'https://standards.example.org/rfc/9110',
  'https://community.synthetic.example/t/faq',
  'https://www.video-host.example/watch?v=intro',
];

export interface SyntheticPage {
  path: string;
  content: string;
  linkCount: number;
}

export function slugOf(heading: string): string {
  return heading
    .toLowerCase()
    .replace(/[^a-z0-9 _-]/g, '')
    .replace(/ /g, '-');
}

/** Writes one link of a kind drawn by weight; returns the inline text and, for reference links, a definition. */
function link(i: number, o: ResolvedOptions, random: Random, stride: number, refs: string[]): string {
  const roll = random();
  const near = 1 + ((i + 1 + Math.floor(random() * 20)) % (o.pages - 1));
  const t = roll < 0.7 ? zipfTarget(random, o.pages, stride) : near;
  const rel = relativePath(folderOf(i, o.seed), pathOf(t, o.seed));
  const label = titleOf(t, o.seed);
  if (roll < 0.3) return `[${label}](${rel})`;
  if (roll < 0.38) return `[${label}](${rel}#${slugOf(pick(random, headingsOf(t, o.seed)))})`;
  if (roll < 0.46) return `[${label}](${SYNTHETIC_BASE_PATH}/${pathOf(t, o.seed).replace(/\.md$/, '')})`;
  if (roll < 0.54) return `[[${stemOf(t, o.seed)}]]`;
  if (roll < 0.58) return `[[${stemOf(t, o.seed)}|${label.toLowerCase()}]]`;
  if (roll < 0.64) {
    refs.push(`[ref-${refs.length + 1}]: ${rel}`);
    return `[${label}][ref-${refs.length}]`;
  }
  if (roll < 0.69) return `<a href="${rel}">${label}</a>`;
  if (roll < 0.75) return `[${label}](${rel})`;
  if (roll < 0.8) {
    const k = Math.floor(random() * (ASSET_COUNT + 2)); // the last two numbers are missing assets
    return `![Diagram ${k}](${relativePath(folderOf(i, o.seed), `assets/diagram-${k}.svg`)})`;
  }
  if (roll < 0.88) return `[the vendor notes](${pick(random, EXTERNAL)})`;
  if (roll < 0.91) return `<${pick(random, EXTERNAL)}>`;
  if (roll < 0.94) return `${pick(random, EXTERNAL)} `;
  if (roll < 0.97) return `[this section](#${slugOf(headingsOf(i, o.seed)[0]!)})`;
  return `[the old page](missing-${fnv1a(`${i}|${roll}`) % 1000}.md)`; // broken on purpose
}

/** A page whose text and links depend only on (seed, page number) and, for changed pages, the change seed. */
export function renderSyntheticPage(i: number, o: ResolvedOptions, changed: boolean): SyntheticPage {
  const random = mulberry32(fnv1a(`page|${o.seed}|${i}|${changed ? o.changeSeed : 'base'}`));
  const stride = coprimeStride(o.pages - 1, 7919);
  const linkTarget = Math.round(o.linksPerPage * (0.7 + 0.6 * random()));
  // 0.93: link-heavy pages overshoot their share; measured on 2,000 pages so the total lands near targetBytes.
  const byteTarget = 0.93 * (o.targetBytes / o.pages) * (0.8 + 0.4 * random());
  const headings = headingsOf(i, o.seed);
  const refs: string[] = [];
  const lines = [
    '---',
    `title: "${titleOf(i, o.seed)}"`,
    `tags: [${folderOf(i, o.seed).split('/')[0] || 'home'}]`,
    '---',
    '',
    `# ${titleOf(i, o.seed)}`,
    '',
  ];
  let bytes = lines.join('\n').length;
  let links = 0;
  const push = (line: string) => {
    lines.push(line);
    bytes += line.length + 1;
  };
  for (let s = 0; s < headings.length; s++) {
    push(`## ${headings[s]}`);
    push('');
    const quota = Math.round((linkTarget * (s + 1)) / headings.length) - links;
    const sectionBytes = (byteTarget * (s + 1)) / headings.length;
    for (let k = 0; k < quota; k++, links++) {
      const refsBefore = refs.length;
      push(`${sentence(random).slice(0, -1)}, as ${link(i, o, random, stride, refs)} explains.`);
      if (refs.length > refsBefore) bytes += refs[refsBefore]!.length + 1; // its definition is written at the end
    }
    if (s === 1) {
      push('');
      codeBlock(random).forEach(push);
    }
    push('');
    while (bytes + 90 < sectionBytes) push(sentence(random));
    push('');
  }
  if (refs.length) refs.forEach(push);
  return { path: pathOf(i, o.seed), content: lines.join('\n') + '\n', linkCount: links };
}
