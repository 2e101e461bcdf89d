import { type ChildProcess, spawn } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';

// From the file path, not `new URL(..., import.meta.url)`, so it also works under jsdom, whose `URL` is the page's.
const root = resolve(dirname(fileURLToPath(import.meta.url)), '../..');

export interface RunningServer {
  url: string;
  port: number;
  dataDir: string;
  process: ChildProcess;
  output: () => string;
  /** Resolves with the exit code, or with the signal's name when the process ended by re-raising it. */
  stop(signal?: NodeJS.Signals): Promise<number | string | null>;
  cleanup(): void;
}

export async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.listen(0, '127.0.0.1', () => {
      const address = server.address();
      server.close(() => (typeof address === 'object' && address ? resolve(address.port) : reject(new Error('no port'))));
    });
  });
}

/** Starts the built product (`npm start` does the same) on a free port with a fresh data folder. */
export async function startServer(
  env: Record<string, string> = {},
  options: { dataDir?: string; timeoutMs?: number } = {},
): Promise<RunningServer> {
  const port = await freePort();
  const dataDir = options.dataDir ?? mkdtempSync(join(tmpdir(), 'linkloom-e2e-'));
  let log = '';
  const child = spawn(process.execPath, ['scripts/start.mjs'], {
    cwd: root,
    env: { ...process.env, PORT: String(port), HOST: '127.0.0.1', DATA_DIR: dataDir, LOG_FORMAT: 'text', ...env },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  child.stdout!.on('data', (d) => (log += d));
  child.stderr!.on('data', (d) => (log += d));
  const url = `http://127.0.0.1:${port}`;
  const deadline = Date.now() + (options.timeoutMs ?? 120_000);
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`server exited with ${child.exitCode}:\n${log}`);
    try {
      const response = await fetch(`${url}/api/health`);
      if (response.ok) break;
    } catch {
      /* not yet listening */
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  if (Date.now() >= deadline) {
    child.kill('SIGKILL');
    throw new Error(`server did not answer within the time limit:\n${log}`);
  }
  const stop = (signal: NodeJS.Signals = 'SIGTERM') =>
    new Promise<number | string | null>((resolve) => {
      if (child.exitCode !== null) return resolve(child.exitCode);
      child.once('exit', (code, by) => resolve(code ?? by));
      child.kill(signal);
    });
  return {
    url,
    port,
    dataDir,
    process: child,
    output: () => log,
    stop,
    cleanup: () => rmSync(dataDir, { recursive: true, force: true }),
  };
}
