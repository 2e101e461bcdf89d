// `npm run restore -- <backup.tar.gz>`: brings a backup back into DATA_DIR. The current database folder is
// kept beside it (renamed), never deleted. The server must be stopped.
import { PGlite } from '@electric-sql/pglite';
import { existsSync, readFileSync, renameSync } from 'node:fs';
import { join, resolve } from 'node:path';

const file = process.argv[2];
const dataDir = resolve(process.env.DATA_DIR ?? './data');
if (!file || !existsSync(file)) {
  console.error('Usage: npm run restore -- <DATA_DIR>/backups/linkloom-backup-<time>.tar.gz   (with DATA_DIR set as for npm start)');
  process.exit(1);
}
const lock = join(dataDir, 'linkloom.lock');
if (existsSync(lock)) {
  const pid = Number(readFileSync(lock, 'utf8').trim());
  try {
    process.kill(pid, 0);
    console.error(`Linkloom is running (pid ${pid}) on ${dataDir}: stop it first, then restore.`);
    process.exit(1);
  } catch {
    /* stale lock: the server is not running */
  }
}
const target = join(dataDir, 'pglite');
let keptAside = null;
if (existsSync(target)) {
  keptAside = `${target}.before-restore-${Date.now()}`;
  renameSync(target, keptAside);
}
const db = new PGlite(target, { loadDataDir: new Blob([readFileSync(file)]) });
await db.waitReady;
const users = await db.query('select count(*)::int as n from users');
await db.close();
console.log(`Restored ${file} into ${target} (${users.rows[0].n} users).`);
if (keptAside) console.log(`The previous database folder was kept at ${keptAside}; delete it once you are sure.`);
