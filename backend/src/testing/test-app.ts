import 'reflect-metadata';
import type { INestApplication } from '@nestjs/common';
import type { Role } from '@linkloom/shared';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';
import { type AppConfig, loadConfig } from '../config/app-config.js';
import { createApp } from '../create-app.js';
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from '../modules/demo/demo-accounts.js';
import { createTestDatabase } from './test-database.js';

export interface TestApp {
  app: INestApplication;
  config: AppConfig;
  http: ReturnType<typeof request>;
  /** A fresh access token of the demo user with that role. */
  tokenFor(role: Role): Promise<string>;
  close(): Promise<void>;
}

/**
 * The real Nest app on a throwaway database (in-memory PGlite, or a fresh PostgreSQL database when
 * TEST_DATABASE_URL is set) with the demo users seeded. Demo doc-set content is off unless asked for.
 */
export async function createTestApp(overrides: Partial<AppConfig> = {}, env: NodeJS.ProcessEnv = {}): Promise<TestApp> {
  const dataDir = mkdtempSync(join(tmpdir(), 'linkloom-test-'));
  const database = await createTestDatabase();
  const config = loadConfig(
    { DEMO: 'true', LOG_REQUESTS: 'false', ...env },
    {
      dataDir,
      inMemoryDatabase: !database.url,
      databaseUrl: database.url,
      jwtSecret: 'test-secret-that-is-long-enough-0123456789',
      demoContent: false,
      ...overrides,
    },
  );
  const app = await createApp(config, { logger: false });
  const server = app.getHttpServer();
  const tokens = new Map<Role, string>();
  return {
    app,
    config,
    http: request(server),
    async tokenFor(role) {
      const cached = tokens.get(role);
      if (cached) return cached;
      const account = DEMO_ACCOUNTS.find((a) => a.role === role)!;
      const response = await request(server).post('/api/auth/sign-in').send({ email: account.email, password: DEMO_PASSWORD });
      if (response.status !== 200) throw new Error(`sign-in as ${role} failed: ${response.status} ${JSON.stringify(response.body)}`);
      tokens.set(role, response.body.accessToken);
      return response.body.accessToken;
    },
    async close() {
      await app.close();
      await database.drop();
      rmSync(dataDir, { recursive: true, force: true });
    },
  };
}
