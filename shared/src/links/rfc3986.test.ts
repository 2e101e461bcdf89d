import { describe, expect, test } from 'vitest';
import { formatReference, removeDotSegments, resolveReference } from './rfc3986.js';

// Source: RFC 3986 (Berners-Lee, Fielding, Masinter, 2005), section 5.4 "Reference Resolution Examples",
// base URI "http://a/b/c/d;p?q". Adapted to path resolution: the scheme and authority "http://a" are dropped
// from the base and from every expected result, so the base is path "/b/c/d;p" with query "q".
const base = { path: '/b/c/d;p', query: 'q' };

// Section 5.4.1 "Normal Examples". Left out, with reason: "g:h" (has a scheme) and "//g" (has an authority):
// our resolver classifies those before path resolution (scheme -> external/unsafe, `//host` -> external).
const normal: [string, string][] = [
  ['g', '/b/c/g'],
  ['./g', '/b/c/g'],
  ['g/', '/b/c/g/'],
  ['/g', '/g'],
  ['?y', '/b/c/d;p?y'],
  ['g?y', '/b/c/g?y'],
  ['#s', '/b/c/d;p?q#s'],
  ['g#s', '/b/c/g#s'],
  ['g?y#s', '/b/c/g?y#s'],
  [';x', '/b/c/;x'],
  ['g;x', '/b/c/g;x'],
  ['g;x?y#s', '/b/c/g;x?y#s'],
  ['', '/b/c/d;p?q'],
  ['.', '/b/c/'],
  ['./', '/b/c/'],
  ['..', '/b/'],
  ['../', '/b/'],
  ['../g', '/b/g'],
  ['../..', '/'],
  ['../../', '/'],
  ['../../g', '/g'],
];

// Section 5.4.2 "Abnormal Examples". Left out, with reason: "http:g" (has a scheme; the RFC's strict
// parser result is "http:g" and our resolver treats any scheme before path resolution).
const abnormal: [string, string][] = [
  ['../../../g', '/g'],
  ['../../../../g', '/g'],
  ['/./g', '/g'],
  ['/../g', '/g'],
  ['g.', '/b/c/g.'],
  ['.g', '/b/c/.g'],
  ['g..', '/b/c/g..'],
  ['..g', '/b/c/..g'],
  ['./../g', '/b/g'],
  ['./g/.', '/b/c/g/'],
  ['g/./h', '/b/c/g/h'],
  ['g/../h', '/b/c/h'],
  ['g;x=1/./y', '/b/c/g;x=1/y'],
  ['g;x=1/../y', '/b/c/y'],
  ['g?y/./x', '/b/c/g?y/./x'],
  ['g?y/../x', '/b/c/g?y/../x'],
  ['g#s/./x', '/b/c/g#s/./x'],
  ['g#s/../x', '/b/c/g#s/../x'],
];

describe('RFC 3986 section 5.4 reference resolution, adapted to paths', () => {
  test.each(normal)('5.4.1 normal: %s -> %s', (reference, expected) => {
    expect(formatReference(resolveReference(base, reference))).toBe(expected);
  });
  test.each(abnormal)('5.4.2 abnormal: %s -> %s', (reference, expected) => {
    expect(formatReference(resolveReference(base, reference))).toBe(expected);
  });
  test('climbing above the root is reported while the RFC result is kept', () => {
    // RFC 3986 5.4.2: "../../../g" resolves to "/g"; Linkloom additionally needs to know it climbed (docs/link-rules.md rule 4).
    expect(resolveReference(base, '../../../g')).toMatchObject({ path: '/g', aboveRoot: true });
    expect(resolveReference(base, '../../g').aboveRoot).toBe(false);
  });
  test('remove_dot_segments worked examples of section 5.2.4', () => {
    // RFC 3986 section 5.2.4 walks "/a/b/c/./../../g" -> "/a/g" and "mid/content=5/../6" -> "mid/6".
    expect(removeDotSegments('/a/b/c/./../../g').path).toBe('/a/g');
    expect(removeDotSegments('mid/content=5/../6').path).toBe('mid/6');
  });
});
