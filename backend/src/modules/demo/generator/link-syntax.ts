import { BASE_PATH, SITE_URL } from './scenario.js';
import { folderOf, stemOf } from './page-plan.js';
import type { PagePlan, PlannedLink } from './types.js';

/** Relative reference from one folder to a path, in the shape writers use (`../a/b.md`, `b.md`). */
export function relativePath(fromFolder: string, to: string): string {
  const from = fromFolder ? fromFolder.split('/') : [];
  const parts = to.split('/');
  let i = 0;
  while (i < from.length && i < parts.length - 1 && from[i] === parts[i]) i++;
  return [...Array(from.length - i).fill('..'), ...parts.slice(i)].join('/');
}

/** The published, extensionless path under the site's base path; folders end in `/`. */
export function publishedPath(path: string): string {
  const clean = path === 'index.md' ? '' : path.endsWith('/index.md') ? `${folderOf(path)}/` : path.replace(/\.md$/, '');
  return `${BASE_PATH}/${clean}`;
}

/**
 * The shortest wiki name that finds exactly this page under the lookup order of docs/link-rules.md rule 6: the bare file name when
 * no other page path ends with it (checked as a plain string suffix, the stricter reading), else the full path.
 */
export function wikiName(target: PagePlan, allPaths: readonly string[]): string {
  const stem = stemOf(target.path);
  const full = target.path.replace(/\.md$/, '');
  if (stem === 'index') return full;
  const clashes = allPaths.filter((p) => p !== target.path && p.replace(/\.md$/, '').toLowerCase().endsWith(stem));
  return clashes.length === 0 ? stem : full;
}

export interface LinkSyntax {
  snippet: string;
  href: string;
  definition?: string;
}

export interface SyntaxContext {
  source: string;
  pages: ReadonlyMap<string, PagePlan>;
  allPaths: readonly string[];
  nextRef: () => string;
}

function hrefOf(link: PlannedLink, ctx: SyntaxContext): string {
  if (link.rawHref !== undefined && !link.form.startsWith('wiki')) return link.rawHref;
  const hash = link.fragment ? `#${link.fragment}` : '';
  const target = link.target!;
  if (link.form === 'root-absolute') return publishedPath(target) + hash;
  if (link.form === 'site-url' || link.form === 'site-autolink') return SITE_URL + publishedPath(target) + hash;
  if (target === ctx.source) return hash;
  return relativePath(folderOf(ctx.source), target) + hash;
}

function wikiHref(link: PlannedLink, ctx: SyntaxContext): string {
  if (link.rawHref !== undefined) return link.rawHref;
  const page = ctx.pages.get(link.target!);
  const name = link.form === 'wiki-title' ? page!.title : page ? wikiName(page, ctx.allPaths) : link.target!.split('/').pop()!;
  return link.form === 'wiki-heading' ? `${name}#${link.fragment}` : name;
}

/** Markdown for one planned link, the href exactly as written, and a reference definition where one is needed. */
export function linkSyntax(link: PlannedLink, ctx: SyntaxContext): LinkSyntax {
  const title = ctx.pages.get(link.target ?? '')?.title ?? link.label;
  switch (link.form) {
    case 'wiki':
    case 'wiki-title':
    case 'wiki-heading':
    case 'wiki-image': {
      const href = wikiHref(link, ctx);
      return { snippet: link.form === 'wiki-image' ? `![[${href}]]` : `[[${href}]]`, href };
    }
    case 'wiki-label': {
      const href = wikiHref(link, ctx);
      return { snippet: `[[${href}|${link.label}]]`, href };
    }
    case 'embed': {
      const href = wikiHref(link, ctx);
      return { snippet: `![[${href}]]`, href };
    }
    case 'empty':
      return { snippet: `[${link.label}]()`, href: '' };
    case 'bare-url':
      return { snippet: link.rawHref!, href: link.rawHref! };
    default:
      break;
  }
  const href = hrefOf(link, ctx);
  switch (link.form) {
    case 'site-autolink':
    case 'autolink':
      return { snippet: `<${href}>`, href };
    case 'image':
      return { snippet: `![${link.label}](${href})`, href };
    case 'html':
      return { snippet: `<a href="${href}">${link.label}</a>`, href };
    case 'reference-full': {
      const id = ctx.nextRef();
      return { snippet: `[${link.label}][${id}]`, href, definition: `[${id}]: ${href}` };
    }
    case 'reference-collapsed':
      return { snippet: `[${title}][]`, href, definition: `[${title}]: ${href}` };
    case 'reference-shortcut':
      return { snippet: `[${title}]`, href, definition: `[${title}]: ${href}` };
    default:
      return { snippet: `[${link.label}](${href})`, href };
  }
}
