import 'reflect-metadata';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../testing/test-app.js';

describe('health, API docs, headers and error bodies', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(async () => t?.close());

  it('answers health without sign-in and names the database in use', async () => {
    const response = await t.http.get('/api/health');
    expect(response.status).toBe(200);
    expect(response.body).toMatchObject({ status: 'ok', database: process.env.TEST_DATABASE_URL ? 'postgres' : 'pglite', demo: true });
    expect(response.body.version).toMatch(/^\d+\.\d+\.\d+/);
  });

  it('sends the security headers of OWASP ASVS 5.0 V3.4 and hides X-Powered-By', async () => {
    const response = await t.http.get('/api/health');
    const csp = response.headers['content-security-policy'];
    expect(csp).toContain("default-src 'self'");
    expect(csp).toContain("object-src 'none'");
    expect(csp).toContain("base-uri 'none'");
    expect(csp).toContain("frame-ancestors 'none'");
    expect(response.headers['x-content-type-options']).toBe('nosniff');
    expect(response.headers['referrer-policy']).toBe('no-referrer');
    expect(response.headers['x-powered-by']).toBeUndefined();
    expect(response.headers['x-request-id']).toMatch(/^[0-9a-f-]{36}$/);
  });

  it('publishes OpenAPI documentation listing the routes', async () => {
    const response = await t.http.get('/api/docs-json');
    expect(response.status).toBe(200);
    expect(Object.keys(response.body.paths)).toEqual(expect.arrayContaining(['/api/auth/sign-in', '/api/users', '/api/health']));
  });

  it('answers unknown API routes with a JSON 404 and bad JSON with a clear 400, never a stack', async () => {
    const missing = await t.http.get('/api/nothing-here');
    expect(missing.status).toBe(404);
    expect(missing.body.code).toBe('NOT_FOUND');
    const bad = await t.http.post('/api/auth/sign-in').set('Content-Type', 'application/json').send('{"email": ');
    expect(bad.status).toBe(400);
    expect(bad.body.message).toBe('The request body is not valid JSON.');
    expect(JSON.stringify(bad.body)).not.toMatch(/at .*\.js|node_modules/);
    const big = await t.http
      .post('/api/auth/sign-in')
      .set('Content-Type', 'application/json')
      .send(JSON.stringify({ email: 'x'.repeat(2_000_000), password: 'y' }));
    expect(big.status).toBe(413);
    expect((await t.http.get('/api/health')).status).toBe(200);
  });

  it('rejects query objects and arrays where a number is expected (docs/threats.md check 41)', async () => {
    const admin = await t.tokenFor('admin');
    for (const query of ['pageSize=-1', 'pageSize=1e9', 'pageSize=abc', 'page=NaN', 'pageSize=501', 'page=1&page=2']) {
      const response = await t.http.get(`/api/users?${query}`).set('Authorization', `Bearer ${admin}`);
      expect(response.status, query).toBe(400);
      expect(response.body.code).toBe('VALIDATION_FAILED');
    }
  });
});
