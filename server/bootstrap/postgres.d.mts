// Types for postgres.mjs (plain JavaScript so the bootstrap runs before any package is installed).

export interface ClusterPaths {
  base: string;
  data: string;
  socket: string;
  log: string;
}

export const isRoot: boolean;
/** The folder of PostgreSQL's server binaries, installing Debian's package as root when missing. */
export function ensurePostgresInstalled(log?: (line: string) => void): string;
export function clusterPaths(projectDir: string, name: string): ClusterPaths;
export function isRunning(bin: string, paths: ClusterPaths): boolean;
/** Creates (first time) and starts a cluster on 127.0.0.1:port; `startedByUs` says whether to stop it later. */
export function startCluster(bin: string, paths: ClusterPaths, port: number, options?: { fast?: boolean; log?: (line: string) => void }): { startedByUs: boolean };
export function stopCluster(bin: string, paths: ClusterPaths): void;
export function ensureDatabase(bin: string, port: number, db: string, options?: { recreate?: boolean }): boolean;
export function databaseUrl(port: number, db: string): string;
export function dropDatabase(bin: string, port: number, db: string): void;
export function otherRunsActive(bin: string, port: number): boolean;
