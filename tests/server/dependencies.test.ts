import { describe, expect, it } from 'vitest';
import { spawnSync } from 'node:child_process';
import { readFileSync } from 'node:fs';

/** Issue 23 point 8: what the package installs and what production loads. */
const pkg = JSON.parse(readFileSync('package.json', 'utf8')) as {
  engines: { node: string };
  dependencies: Record<string, string>;
  devDependencies: Record<string, string>;
  scripts: Record<string, string>;
};
const lock = JSON.parse(readFileSync('package-lock.json', 'utf8')) as {
  packages: Record<string, { version?: string; hasInstallScript?: boolean; dev?: boolean }>;
};
const lowerBound = (range: string) => (/(?:>=|\^|~)?\s*(\d+)\.(\d+)/.exec(range) ?? []).slice(1).map(Number);

describe('dependencies', () => {
  it(
    'when the package is read, then concurrently and pg-hstore are gone (nothing imports them; ' +
      'Sequelize loads pg-hstore only for HSTORE columns, which no model has)',
    () => {
      const all = { ...pkg.dependencies, ...pkg.devDependencies };
      expect(Object.keys(all).length).toBeGreaterThan(20);
      expect(all).not.toHaveProperty('concurrently');
      expect(all).not.toHaveProperty('pg-hstore');
      expect(Object.values(pkg.scripts).join(' ')).not.toMatch(/concurrently/);
    },
  );

  it('when the lockfile is read, then one nodemailer is installed, and the mail catcher’s packages are development-only', () => {
    const copies = Object.entries(lock.packages).filter(([path]) => path.endsWith('node_modules/nodemailer'));
    expect(copies.map(([path, entry]) => `${path}@${entry.version}`)).toEqual([
      `node_modules/nodemailer@${pkg.dependencies.nodemailer}`,
    ]);
    for (const name of ['smtp-server', 'mailparser']) {
      expect(pkg.devDependencies).toHaveProperty(name);
      expect(pkg.dependencies).not.toHaveProperty(name);
    }
  });

  it('when engines is read, then it asks for at least what vite and jsdom declare they need (both ≥ 20.19)', () => {
    const ours = lowerBound(pkg.engines.node);
    expect(ours).toEqual([20, 19]);
    for (const tool of ['vite', 'jsdom']) {
      const theirs = (
        JSON.parse(readFileSync(`node_modules/${tool}/package.json`, 'utf8')) as { engines: { node: string } }
      ).engines.node;
      const needed = theirs
        .split('||')
        .map((part) => lowerBound(part))
        .filter((v) => v.length === 2)
        .sort((a, b) => a[0] - b[0] || a[1] - b[1])[0];
      expect(needed, `${tool} engines ${theirs}`).toHaveLength(2);
      expect(ours[0] > needed[0] || (ours[0] === needed[0] && ours[1] >= needed[1]), `${tool} needs ${theirs}`).toBe(
        true,
      );
    }
  });

  it(
    'when npm installs, then no install script runs (.npmrc ignore-scripts), so nothing downloads a ' +
      'binary; the one package with a script is esbuild',
    () => {
      expect(readFileSync('.npmrc', 'utf8')).toMatch(/^ignore-scripts=true$/m);
      const scripted = Object.entries(lock.packages)
        .filter(([, entry]) => entry.hasInstallScript)
        .map(([path]) => path);
      expect(scripted).toEqual(['node_modules/esbuild']);
    },
  );

  it(
    'when the app is built and a mail is prepared in production, then smtp-server and mailparser are never loaded',
    { timeout: 60_000 },
    () => {
      const script = `
      const { createRequire } = await import('node:module');
      const { createApp } = await import('./server/http/app.ts');
      const { usesMailCatcher } = await import('./server/mail/send.ts');
      const handle = createApp();
      await handle.close();
      const loaded = Object.keys(createRequire(import.meta.url).cache);
      const dev = loaded.filter((p) => /node_modules\\/(smtp-server|mailparser)\\//.test(p));
      console.log(JSON.stringify({ catcher: usesMailCatcher(), modules: loaded.length, dev }));
      process.exit(0);`;
      const run = spawnSync(process.execPath, ['--import', 'tsx', '--input-type=module', '-e', script], {
        env: {
          ...process.env,
          NODE_ENV: 'production',
          SESSION_SECRET: 'x'.repeat(40),
          SMTP_HOST: '127.0.0.1',
          LOG_LEVEL: 'silent',
        },
        encoding: 'utf8',
      });
      expect(run.status, run.stderr).toBe(0);
      const result = JSON.parse(run.stdout.trim().split('\n').pop()!) as {
        catcher: boolean;
        modules: number;
        dev: string[];
      };
      expect(result.catcher).toBe(false);
      expect(result.modules).toBeGreaterThan(20);
      expect(result.dev).toEqual([]);
    },
  );
});
