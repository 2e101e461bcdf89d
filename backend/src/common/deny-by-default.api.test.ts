import 'reflect-metadata';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../testing/test-app.js';

// The unsubscribe links of e-mails work without signing in (RFC 8058 section 3); their signed token is the credential.
const PUBLIC = new Set(['POST /api/auth/sign-in', 'GET /api/health', 'GET /api/unsubscribe/{token}', 'POST /api/unsubscribe/{token}']);
const DUMMY_ID = '00000000-0000-4000-8000-000000000000';

/**
 * docs/threats.md check 56, first half: the route list comes from the app's own OpenAPI document, so a route
 * added later is covered without editing this test. Every route but sign-in, health and unsubscribe must refuse an
 * anonymous caller and a viewer must be refused every write that needs a higher role.
 */
describe('deny by default', () => {
  let t: TestApp;
  let routes: { method: string; path: string }[];
  beforeAll(async () => {
    t = await createTestApp();
    const doc = (await t.http.get('/api/docs-json')).body as { paths: Record<string, Record<string, unknown>> };
    routes = Object.entries(doc.paths).flatMap(([path, methods]) =>
      Object.keys(methods).map((method) => ({ method: method.toUpperCase(), path })),
    );
  });
  afterAll(async () => t?.close());

  it("lists the product's routes (so the checks below are not vacuous)", () => {
    expect(routes.length).toBeGreaterThan(40);
    expect(routes.map((r) => `${r.method} ${r.path}`)).toEqual(
      expect.arrayContaining([...PUBLIC, 'POST /api/doc-sets/{docSetId}/snapshots', 'GET /api/tasks']),
    );
  });

  it('answers every non-public route with 401 when no token is sent', async () => {
    const open: string[] = [];
    for (const route of routes) {
      if (PUBLIC.has(`${route.method} ${route.path}`)) continue;
      const url = route.path.replace(/\{runId\}/g, 'latest').replace(/\{[^}]+\}/g, DUMMY_ID);
      const response = await t.http[route.method.toLowerCase() as 'get'](url).send({});
      if (response.status !== 401) open.push(`${route.method} ${route.path} -> ${response.status}`);
    }
    expect(open).toEqual([]);
  });

  it('refuses a viewer every admin-only route', async () => {
    const viewer = await t.tokenFor('viewer');
    const adminOnly = routes.filter((r) => /^\/api\/(users|mail|outbox)/.test(r.path) || /\/tokens/.test(r.path));
    expect(adminOnly.length).toBeGreaterThan(5);
    for (const route of adminOnly) {
      const url = route.path.replace(/\{[^}]+\}/g, DUMMY_ID);
      const response = await t.http[route.method.toLowerCase() as 'get'](url).set('Authorization', `Bearer ${viewer}`).send({});
      expect(response.status, `${route.method} ${route.path}`).toBe(403);
    }
  });
});
