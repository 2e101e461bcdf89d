import { PGlite } from '@electric-sql/pglite';
import { existsSync, mkdirSync, readdirSync, readFileSync, renameSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';

/** Written once initdb finished; a folder without it and without PG_VERSION was never completed. */
const COMPLETE_MARKER = '.linkloom-initialized';

export class DataDirUnreadableError extends Error {
  readonly code = 'DATA_DIR_UNREADABLE';
  constructor(dir: string, cause: unknown) {
    super(
      [
        `DATA_DIR_UNREADABLE: the embedded database in ${dir} could not be opened (${String((cause as Error)?.message ?? cause)}).`,
        'Nothing was changed or deleted. To recover:',
        '  1. Keep a copy of the folder as it is (e.g. cp -a <DATA_DIR> <DATA_DIR>.damaged).',
        '  2. Restore the newest backup: npm run restore -- <DATA_DIR>/backups/<newest file>.tar.gz',
        '     (backups are written nightly into <DATA_DIR>/backups; npm run backup makes one by hand).',
        '  3. Start Linkloom again. Imports since that backup need to be uploaded again.',
      ].join('\n'),
    );
  }
}

function isEmptyDir(dir: string): boolean {
  return !existsSync(dir) || readdirSync(dir).length === 0;
}

/** Creates a new cluster in a temporary folder and renames it into place, so a kill during initdb leaves no half folder. */
async function initialise(dir: string): Promise<void> {
  const tmp = `${dir}.initialising`;
  rmSync(tmp, { recursive: true, force: true });
  mkdirSync(tmp, { recursive: true });
  const client = new PGlite(tmp);
  await client.waitReady;
  await client.close();
  writeFileSync(join(tmp, COMPLETE_MARKER), new Date().toISOString());
  rmSync(dir, { recursive: true, force: true }); // only ever an empty folder here
  renameSync(tmp, dir);
}

/** PGlite leaves a postmaster.pid with its fake pid after an unclean stop; it blocks nothing real. */
function removeStalePidFile(dir: string): boolean {
  const file = join(dir, 'postmaster.pid');
  if (!existsSync(file)) return false;
  const pid = Number(readFileSync(file, 'utf8').split('\n')[0]);
  if (pid > 0 && pid !== process.pid) {
    try {
      process.kill(pid, 0);
      return false;
    } catch {
      /* not running */
    }
  }
  rmSync(file);
  return true;
}

export async function openPglite(dir: string): Promise<PGlite> {
  const hasCluster = existsSync(join(dir, 'PG_VERSION'));
  if (!hasCluster) {
    if (!isEmptyDir(dir) && existsSync(join(dir, COMPLETE_MARKER))) {
      throw new DataDirUnreadableError(dir, new Error('PG_VERSION is missing from a completed data folder'));
    }
    if (!isEmptyDir(dir)) {
      // Proven never completed (no marker, no PG_VERSION): set it aside rather than delete it.
      renameSync(dir, `${dir}.incomplete-${Date.now()}`);
    }
    await initialise(dir);
  }
  for (let attempt = 0; ; attempt++) {
    try {
      const client = new PGlite(dir);
      await client.waitReady;
      return client;
    } catch (error) {
      if (attempt === 0 && removeStalePidFile(dir)) continue;
      throw new DataDirUnreadableError(dir, error);
    }
  }
}
