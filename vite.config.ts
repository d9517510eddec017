import { defineConfig } from 'vitest/config';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';
import { gzipSync } from 'node:zlib';
import type { Plugin } from 'vite';

const apiPort = process.env.PORT ?? '3000';

/** Prints the gzip size of each entry's first-load JS (the entry chunk and its static imports); budget 250 kB, OpenChemLib lazy. */
function firstLoadReport(budgetKb = 250): Plugin {
  return {
    name: 'rfolio-first-load-report',
    apply: 'build',
    writeBundle(_options, bundle) {
      const chunks = new Map(
        Object.values(bundle).flatMap((c) => (c.type === 'chunk' ? [[c.fileName, c] as const] : [])),
      );
      const kb = (name: string) => gzipSync(chunks.get(name)!.code, { level: 9 }).length / 1000;
      const hasOcl = (name: string) =>
        chunks.get(name)!.moduleIds.some((id) => id.includes('node_modules/openchemlib'));
      const firstLoad = new Set<string>();
      for (const entry of chunks.values()) {
        if (!entry.isEntry) continue;
        const seen = new Set<string>();
        const visit = (name: string) => {
          if (seen.has(name) || !chunks.has(name)) return;
          seen.add(name);
          chunks.get(name)!.imports.forEach(visit);
        };
        visit(entry.fileName);
        seen.forEach((name) => firstLoad.add(name));
        const total = [...seen].reduce((n, name) => n + kb(name), 0);
        const ocl = [...seen].some(hasOcl);
        const verdict = total > budgetKb || ocl ? 'OVER BUDGET' : 'within budget';
        this.info(
          `first-load JS (${entry.name}): ${total.toFixed(1)} kB gzip in ${seen.size} chunk(s); budget ` +
            `${budgetKb} kB, ${verdict}; OpenChemLib ${ocl ? 'INCLUDED' : 'not included'}`,
        );
      }
      for (const name of chunks.keys()) {
        if (!firstLoad.has(name) && hasOcl(name))
          this.info(`lazy OpenChemLib chunk: ${name} ${kb(name).toFixed(1)} kB gzip`);
      }
    },
  };
}

export default defineConfig({
  plugins: [react(), tailwindcss(), firstLoadReport()],
  server: {
    host: '127.0.0.1',
    port: 5173,
    proxy: { '/api': `http://127.0.0.1:${apiPort}` },
  },
  build: {
    outDir: 'dist/client',
    emptyOutDir: true,
    chunkSizeWarningLimit: 1600,
    reportCompressedSize: true,
  },
  test: {
    projects: [
      {
        extends: true,
        test: { name: 'shared', environment: 'node', include: ['tests/shared/**/*.test.ts'] },
      },
      {
        extends: true,
        test: {
          name: 'server',
          environment: 'node',
          include: ['tests/server/**/*.test.ts'],
          setupFiles: ['tests/helpers/server-setup.ts'],
          fileParallelism: false,
          testTimeout: 30_000,
          hookTimeout: 60_000,
        },
      },
      {
        extends: true,
        test: {
          name: 'client',
          environment: 'jsdom',
          include: ['tests/client/**/*.test.tsx', 'tests/client/**/*.test.ts'],
          setupFiles: ['tests/helpers/client-setup.ts'],
        },
      },
      {
        extends: true,
        test: {
          name: 'e2e',
          environment: 'node',
          include: ['tests/e2e/**/*.test.ts'],
          globalSetup: ['tests/e2e/global-setup.ts'],
          fileParallelism: false,
          testTimeout: 120_000,
          hookTimeout: 120_000,
        },
      },
    ],
  },
});
