import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import { apiAs } from './support/demo.js';
import { type RunningServer, startServer } from './support/server.js';

const root = fileURLToPath(new URL('..', import.meta.url));

function script(name: 'backup' | 'restore', dataDir: string, args: string[] = []) {
  return spawnSync(process.execPath, [`scripts/${name}.mjs`, ...args], {
    cwd: root,
    env: { ...process.env, DATA_DIR: dataDir },
    encoding: 'utf8',
  });
}

describe('backup and restore of the embedded database (docs/threats.md check 72)', () => {
  const servers: RunningServer[] = [];
  const restoredDir = mkdtempSync(join(tmpdir(), 'linkloom-restored-'));
  afterAll(async () => {
    for (const s of servers) {
      await s.stop('SIGTERM');
      s.cleanup();
    }
    rmSync(restoredDir, { recursive: true, force: true });
  });

  it('backs up a running server, restores into a fresh folder, and the restored copy serves the same data', async () => {
    const original = await startServer({ DEMO_CONTENT: 'false' });
    servers.push(original);
    const admin = await apiAs(original.url, 'admin@demo.linkloom.test');
    const before = await admin<{ total: number; items: { email: string }[] }>('/api/users');

    const backup = script('backup', original.dataDir);
    expect(backup.status, backup.stderr).toBe(0);
    expect(backup.stdout).toContain(`Backup written by the running server (pid ${original.process.pid})`);
    const files = readdirSync(join(original.dataDir, 'backups'));
    expect(files).toHaveLength(1);

    // Restoring into a folder a server holds is refused.
    const refused = script('restore', original.dataDir, [join(original.dataDir, 'backups', files[0])]);
    expect(refused.status).toBe(1);
    expect(refused.stderr).toContain('stop it first');

    const restore = script('restore', restoredDir, [join(original.dataDir, 'backups', files[0])]);
    expect(restore.status, restore.stderr).toBe(0);
    expect(restore.stdout).toContain(`(${before.total} users)`);
    expect(existsSync(join(restoredDir, 'pglite', 'PG_VERSION'))).toBe(true);

    const copy = await startServer({ DEMO_CONTENT: 'false' }, { dataDir: restoredDir });
    servers.push(copy);
    const after = await (await apiAs(copy.url, 'admin@demo.linkloom.test'))<{ total: number; items: { email: string }[] }>('/api/users');
    expect(after.items.map((u) => u.email)).toEqual(before.items.map((u) => u.email));
  });
});
