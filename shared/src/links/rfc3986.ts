/**
 * Reference resolution of RFC 3986 (Berners-Lee, Fielding, Masinter, "Uniform Resource Identifier:
 * Generic Syntax", 2005), section 5.2.2-5.2.4, restricted to path, query and fragment: scheme and
 * authority are classified earlier by the resolver. `aboveRoot` reports a `..` that the RFC silently
 * drops at the root, which for a doc set means "outside the doc set".
 */
export function removeDotSegments(path: string): { path: string; aboveRoot: boolean } {
  const output: string[] = [];
  let aboveRoot = false;
  const absolute = path.startsWith('/');
  const segments = (absolute ? path.slice(1) : path).split('/');
  segments.forEach((segment, i) => {
    const last = i === segments.length - 1;
    if (segment === '.') {
      if (last) output.push('');
    } else if (segment === '..') {
      if (output.length === 0) aboveRoot = true;
      else output.pop();
      if (last) output.push('');
    } else output.push(segment);
  });
  return { path: (absolute ? '/' : '') + output.join('/'), aboveRoot };
}

/** Section 5.2.3 for a base with an authority: an empty base path merges as "/". */
export function mergePaths(basePath: string, reference: string): string {
  const slash = basePath.lastIndexOf('/');
  return slash < 0 ? '/' + reference : basePath.slice(0, slash + 1) + reference;
}

export interface UriParts {
  path: string;
  query: string | null;
  fragment: string | null;
}

export function splitReference(reference: string): UriParts {
  const hash = reference.indexOf('#');
  const fragment = hash < 0 ? null : reference.slice(hash + 1);
  const beforeHash = hash < 0 ? reference : reference.slice(0, hash);
  const question = beforeHash.indexOf('?');
  const query = question < 0 ? null : beforeHash.slice(question + 1);
  return { path: question < 0 ? beforeHash : beforeHash.slice(0, question), query, fragment };
}

/** Section 5.2.2 (strict) without scheme and authority components. */
export function resolveReference(base: { path: string; query: string | null }, reference: string): UriParts & { aboveRoot: boolean } {
  const ref = splitReference(reference);
  if (ref.path === '') return { path: base.path, query: ref.query ?? base.query, fragment: ref.fragment, aboveRoot: false };
  const merged = ref.path.startsWith('/') ? ref.path : mergePaths(base.path, ref.path);
  const { path, aboveRoot } = removeDotSegments(merged);
  return { path, query: ref.query, fragment: ref.fragment, aboveRoot };
}

export function formatReference(parts: UriParts): string {
  return parts.path + (parts.query === null ? '' : '?' + parts.query) + (parts.fragment === null ? '' : '#' + parts.fragment);
}
