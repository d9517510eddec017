// Dependency-free set-up steps shared by `npm start`, `npm run dev` and `npm test`.
import { spawnSync } from 'node:child_process';
import { existsSync, readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';

export function sh(cmd, args, opts = {}) {
  const r = spawnSync(cmd, args, { stdio: 'inherit', ...opts });
  if (r.status !== 0) {
    console.error(`\n✗ ${cmd} ${args.join(' ')} exited with ${r.status ?? r.signal}`);
    process.exit(r.status ?? 1);
  }
}

/** Installs npm dependencies when node_modules is missing or older than the lockfile. */
export function ensureNodeModules(root) {
  const marker = join(root, 'node_modules', '.package-lock.json');
  const lock = join(root, 'package-lock.json');
  if (existsSync(marker) && statSync(marker).mtimeMs >= statSync(lock).mtimeMs) return;
  console.log('Installing npm dependencies (npm ci)…');
  sh('npm', ['ci', '--no-audit', '--no-fund'], { cwd: root });
}

function newestMtime(path) {
  if (!existsSync(path)) return 0;
  const st = statSync(path);
  if (!st.isDirectory()) return st.mtimeMs;
  let newest = st.mtimeMs;
  for (const entry of readdirSync(path)) newest = Math.max(newest, newestMtime(join(path, entry)));
  return newest;
}

/** Builds the client with Vite when any client input is newer than the last build. */
export function ensureClientBuild(root) {
  const built = join(root, 'dist', 'client', 'index.html');
  const inputs = ['src', 'shared', 'index.html', 'vite.config.ts', 'tailwind.config.ts', 'package-lock.json'];
  const newestInput = Math.max(...inputs.map((p) => newestMtime(join(root, p))));
  if (existsSync(built) && statSync(built).mtimeMs >= newestInput) return;
  console.log('Building the client (vite build)…');
  sh(join(root, 'node_modules', '.bin', 'vite'), ['build', '--logLevel', 'warn'], { cwd: root });
}

/** Installs Debian's chromium for the browser tests when it is missing (root only). */
export function ensureChromium(isRoot) {
  const exe = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';
  if (existsSync(exe)) return exe;
  if (!isRoot) {
    console.error("Browser tests need Debian's chromium: sudo apt-get install -y chromium (or set CHROMIUM_PATH).");
    process.exit(1);
  }
  console.log("Installing Debian's chromium for the browser tests (apt-get)…");
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  sh('apt-get', ['update'], { env });
  sh('apt-get', ['install', '-y', '--no-install-recommends', 'chromium'], { env });
  return exe;
}
