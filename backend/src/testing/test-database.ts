import { randomBytes } from 'node:crypto';
import pg from 'pg';

/**
 * When TEST_DATABASE_URL points at a PostgreSQL server, each test app gets its own fresh database there
 * (created here, dropped on close); otherwise tests use an in-memory PGlite.
 */
export async function createTestDatabase(): Promise<{ url: string | null; drop: () => Promise<void> }> {
  const adminUrl = process.env.TEST_DATABASE_URL;
  if (!adminUrl) return { url: null, drop: async () => undefined };
  const name = `linkloom_test_${randomBytes(6).toString('hex')}`;
  const admin = new pg.Client({ connectionString: adminUrl });
  await admin.connect();
  await admin.query(`CREATE DATABASE ${name}`);
  await admin.end();
  const url = new URL(adminUrl);
  url.pathname = `/${name}`;
  return {
    url: url.toString(),
    drop: async () => {
      const client = new pg.Client({ connectionString: adminUrl });
      await client.connect();
      await client.query(`DROP DATABASE IF EXISTS ${name} WITH (FORCE)`);
      await client.end();
    },
  };
}
