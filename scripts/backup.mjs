// `npm run backup`: a compressed copy of the embedded database into DATA_DIR/backups.
// While the server runs it holds the data folder, so it is asked (SIGUSR2) to write the copy itself.
import { PGlite } from '@electric-sql/pglite';
import { existsSync, mkdirSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join, resolve } from 'node:path';

const dataDir = resolve(process.env.DATA_DIR ?? './data');
const folder = join(dataDir, 'backups');
const lock = join(dataDir, 'linkloom.lock');
const list = () =>
  existsSync(folder)
    ? readdirSync(folder)
        .filter((f) => f.startsWith('linkloom-backup-'))
        .sort()
    : [];

function runningPid() {
  if (!existsSync(lock)) return null;
  const pid = Number(readFileSync(lock, 'utf8').trim());
  try {
    process.kill(pid, 0);
    return pid;
  } catch {
    return null;
  }
}

if (process.env.DATABASE_URL) {
  console.error('DATABASE_URL is set: back up that PostgreSQL server with pg_dump; Linkloom only backs up its embedded database.');
  process.exit(1);
}
if (!existsSync(join(dataDir, 'pglite', 'PG_VERSION'))) {
  console.error(`No Linkloom database in ${dataDir} (set DATA_DIR to the data folder).`);
  process.exit(1);
}
const pid = runningPid();
if (pid) {
  const before = new Set(list());
  process.kill(pid, 'SIGUSR2');
  const deadline = Date.now() + 120_000;
  while (Date.now() < deadline) {
    const fresh = list().filter((f) => !before.has(f));
    if (fresh.length) {
      await new Promise((r) => setTimeout(r, 500));
      console.log(`Backup written by the running server (pid ${pid}): ${join(folder, fresh[0])}`);
      process.exit(0);
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  console.error(`The running server (pid ${pid}) did not write a backup within 2 minutes; see its log.`);
  process.exit(1);
}
const db = new PGlite(join(dataDir, 'pglite'));
await db.query('CHECKPOINT');
const dump = await db.dumpDataDir('gzip');
await db.close();
mkdirSync(folder, { recursive: true });
const file = join(folder, `linkloom-backup-${new Date().toISOString().replace(/[:.]/g, '-')}.tar.gz`);
writeFileSync(file, Buffer.from(await dump.arrayBuffer()), { mode: 0o600 });
console.log(`Backup written: ${file}`);
