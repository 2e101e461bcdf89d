import 'reflect-metadata';
import { contractNames } from '@linkloom/shared';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../testing/test-app.js';

interface Operation {
  parameters?: { name: string; in: string; required?: boolean }[];
  responses: Record<string, { content?: Record<string, { schema?: Record<string, unknown> }> }>;
}
interface Document {
  paths: Record<string, Record<string, Operation>>;
  components: { schemas: Record<string, unknown> };
}

function refsIn(value: unknown): string[] {
  if (Array.isArray(value)) return value.flatMap(refsIn);
  if (typeof value !== 'object' || value === null) return [];
  return Object.entries(value).flatMap(([key, v]) => (key === '$ref' && typeof v === 'string' ? [v] : refsIn(v)));
}

/** The OpenAPI document (OpenAPI 3.0.3 specification, "Components Object" and "Reference Object"), read from the app itself. */
describe('the OpenAPI document', () => {
  let t: TestApp;
  let doc: Document;
  let operations: { route: string; operation: Operation }[];
  beforeAll(async () => {
    t = await createTestApp();
    doc = (await t.http.get('/api/docs-json')).body as Document;
    operations = Object.entries(doc.paths).flatMap(([path, methods]) =>
      Object.entries(methods).map(([method, operation]) => ({ route: `${method.toUpperCase()} ${path}`, operation })),
    );
  });
  afterAll(async () => t?.close());

  it('names every shared response shape as a component', () => {
    const names = [...contractNames()];
    expect(names.length).toBeGreaterThan(40);
    expect(Object.keys(doc.components.schemas)).toEqual(expect.arrayContaining(names));
  });

  it('describes the success answer of every route: a component by reference, no body (204) or a file', () => {
    const undescribed: string[] = [];
    for (const { route, operation } of operations) {
      const success = Object.entries(operation.responses).filter(([status]) => /^2\d\d$/.test(status));
      const described = success.some(([status, response]) => {
        if (status === '204') return !response.content;
        const json = response.content?.['application/json']?.schema;
        if (json) return typeof json.$ref === 'string' && Object.keys(json).length === 1;
        return Object.keys(response.content ?? {}).some((type) => type.startsWith('text/'));
      });
      if (success.length !== 1 || !described) undescribed.push(route);
    }
    expect(operations.length).toBeGreaterThan(40);
    expect(undescribed).toEqual([]);
  });

  it('describes the error body of every route, and every reference resolves', () => {
    for (const { route, operation } of operations) {
      expect(refsIn(operation.responses['4XX']), route).toEqual(['#/components/schemas/ApiError']);
    }
    const missing = refsIn(doc).filter((ref) => !(ref.replace('#/components/schemas/', '') in doc.components.schemas));
    expect(missing).toEqual([]);
  });

  it('marks the query parameters a route cannot do without as required, and the defaulted ones as optional', () => {
    const parameter = (route: string, name: string) =>
      operations.find((o) => o.route === route)?.operation.parameters?.find((p) => p.in === 'query' && p.name === name);
    const run = '/api/doc-sets/{docSetId}/runs/{runId}';
    expect(parameter(`GET ${run}/page`, 'path')?.required).toBe(true);
    expect(parameter(`GET ${run}/diff`, 'against')?.required).toBe(true);
    expect(parameter(`GET ${run}/search`, 'q')?.required).toBe(true);
    expect(parameter(`GET ${run}/search`, 'mode')?.required).toBe(false);
    expect(parameter(`GET ${run}/pages`, 'sort')?.required).toBe(false);
    expect(parameter('GET /api/users', 'page')?.required).toBe(false);
  });
});
