// Browser tests use Debian's chromium (no browser download). When it is missing and we are root, install
// it (saying so); otherwise fail with the exact command. Browser tests are never silently skipped.
import { execSync, spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';

function find() {
  for (const candidate of [process.env.CHROMIUM_PATH, '/usr/bin/chromium', '/usr/bin/chromium-browser']) {
    if (candidate && existsSync(candidate)) return candidate;
  }
  try {
    return execSync('command -v chromium', { encoding: 'utf8' }).trim() || null;
  } catch {
    return null;
  }
}

export function ensureChromium() {
  let path = find();
  if (path) return { ok: true, path };
  const command = 'apt-get update && apt-get install -y chromium';
  if (process.getuid?.() === 0) {
    console.log(`Chromium is missing; installing Debian's chromium for the browser tests: ${command}`);
    const result = spawnSync('sh', ['-c', `${command.replace('apt-get install', 'DEBIAN_FRONTEND=noninteractive apt-get install')}`], {
      stdio: 'inherit',
    });
    path = result.status === 0 ? find() : null;
    if (path) return { ok: true, path };
  }
  return { ok: false, message: `The browser tests need Debian's chromium. Install it with:\n  sudo ${command}\nthen run npm test again.` };
}
