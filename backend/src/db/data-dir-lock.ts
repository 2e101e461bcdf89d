import { closeSync, existsSync, openSync, readFileSync, rmSync, writeSync } from 'node:fs';
import { join } from 'node:path';

/** Raised when another live process holds the data folder: two writers would corrupt PGlite's files. */
export class DataDirLockedError extends Error {
  readonly code = 'DATA_DIR_LOCKED';
  constructor(
    readonly dataDir: string,
    readonly pid: number,
  ) {
    super(
      `DATA_DIR_LOCKED: the data folder ${dataDir} is in use by another Linkloom process (pid ${pid}). ` +
        `Stop that process first, or start this one with another DATA_DIR.`,
    );
  }
}

function isAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (error) {
    return (error as NodeJS.ErrnoException).code === 'EPERM';
  }
}

export function lockFilePath(dataDir: string): string {
  return join(dataDir, 'linkloom.lock');
}

/** The pid written in the lock file when its process still runs, else null. */
export function lockHolder(dataDir: string): number | null {
  const file = lockFilePath(dataDir);
  if (!existsSync(file)) return null;
  const pid = Number(readFileSync(file, 'utf8').trim());
  return Number.isInteger(pid) && pid > 0 && pid !== process.pid && isAlive(pid) ? pid : null;
}

/** Takes the lock (pid file created exclusively); a stale file of a dead process is replaced. */
export function acquireDataDirLock(dataDir: string): () => void {
  const file = lockFilePath(dataDir);
  for (let attempt = 0; attempt < 2; attempt++) {
    try {
      const fd = openSync(file, 'wx', 0o600);
      writeSync(fd, String(process.pid));
      closeSync(fd);
      return () => {
        try {
          if (readFileSync(file, 'utf8').trim() === String(process.pid)) rmSync(file);
        } catch {
          /* already gone */
        }
      };
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code !== 'EEXIST') throw error;
      const holder = lockHolder(dataDir);
      if (holder !== null) throw new DataDirLockedError(dataDir, holder);
      rmSync(file, { force: true });
    }
  }
  throw new Error(`Could not take the lock file ${file}`);
}
