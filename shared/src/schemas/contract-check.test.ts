import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { contractProblems, undocumentedFields } from './contract-check.js';
import { contractName, listOf, named } from './contract.js';
import { islandListSchema } from './findings.js';
import { pageDetailSchema } from './run-pages.js';

const island = { islandId: 1, pageCount: 2, pages: [{ path: 'a.md', title: 'A', stationaryScore: 0.1 }] };

describe('response contract check', () => {
  it('passes an answer of exactly the documented shape', () => {
    expect(contractProblems(islandListSchema, { items: [island], total: 1, page: 1, pageSize: 50 })).toEqual([]);
  });

  it('names a renamed field by its path', () => {
    const { pageCount, ...rest } = island;
    const problems = contractProblems(islandListSchema, { items: [{ ...rest, size: pageCount }], total: 1, page: 1, pageSize: 50 });
    expect(problems).toEqual([expect.stringMatching(/^items\.0\.pageCount: /)]);
  });

  it('names fields the schema does not describe, at any depth, once the documented ones are right', () => {
    const body = { items: [{ ...island, pages: [{ ...island.pages[0], internalId: 7 }] }], total: 1, page: 1, pageSize: 50, debug: true };
    expect(contractProblems(islandListSchema, body)).toEqual([
      'items.0.pages.0.internalId: not described by the schema',
      'debug: not described by the schema',
    ]);
  });

  it('keeps free-form maps whole: front matter may hold any key', () => {
    const sent = { frontMatter: { title: 'T', tags: ['a'], nested: { deep: 1 } } };
    const kept = z.object({ frontMatter: z.record(z.string(), z.unknown()) }).parse(sent);
    expect(undocumentedFields(sent, kept)).toEqual([]);
    expect(pageDetailSchema.shape.frontMatter.safeParse(sent.frontMatter).success).toBe(true);
  });

  it('leaves the client lenient: a plain parse drops unknown fields instead of failing', () => {
    // A tolerant reader ignores what it does not need (common practice; M. Fowler, "TolerantReader", 2011, from memory).
    const parsed = islandListSchema.parse({ items: [{ ...island, colour: 'red' }], total: 1, page: 1, pageSize: 50 });
    expect(parsed.items[0]).toEqual(island);
  });
});

describe('named response shapes', () => {
  it('names each shape once and refuses a second shape under a name already taken', () => {
    expect(contractName(islandListSchema)).toBe('IslandList');
    expect(contractName(z.object({}))).toBeUndefined();
    expect(() => listOf('IslandList', z.string())).toThrow(/Two response schemas are named IslandList/);
    expect(() => named('AnotherIslandList', islandListSchema)).toThrow(/already named IslandList/);
  });
});
