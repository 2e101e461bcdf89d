// `npm start`: builds once when a build is missing, then runs the server (honours PORT, DATA_DIR and the rest).
import { spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

const root = fileURLToPath(new URL('..', import.meta.url));
const needed = ['shared/dist/index.js', 'frontend/dist/index.html', 'backend/dist/main.js'];
const missing = needed.filter((file) => !existsSync(`${root}/${file}`));
if (missing.length > 0) {
  console.log(`Linkloom: building first (missing ${missing.join(', ')})...`);
  const build = spawnSync('npm', ['run', 'build'], { cwd: root, stdio: 'inherit' });
  if (build.status !== 0) {
    console.error('Linkloom: the build failed; see the messages above.');
    process.exit(build.status ?? 1);
  }
}
process.chdir(root);
await import(`${root}/backend/dist/main.js`);
