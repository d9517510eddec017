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
/**
 * Creates (first time, with a generated password required by scram-sha-256) and starts a cluster on 127.0.0.1:port;
 * `startedByUs` says whether to stop it later (also true when a crashed earlier start left it running: taken back).
 * A cluster created earlier with trust gets a password and scram-sha-256 on first use.
 */
export function startCluster(
  bin: string,
  paths: ClusterPaths,
  port: number,
  options?: { fast?: boolean; log?: (line: string) => void },
): { startedByUs: boolean };
export function stopCluster(bin: string, paths: ClusterPaths): void;
export function ensureDatabase(bin: string, port: number, db: string, options?: { recreate?: boolean }): boolean;
/** The URL of a database in the project's cluster on this port, with the cluster's generated password. */
export function databaseUrl(port: number, db: string): string;
/** Where the cluster's generated password is kept (inside its data folder, mode 0600). */
export function passwordFile(paths: ClusterPaths): string;
/** The password of the project's cluster on this port, once startCluster has started or found it. */
export function clusterPassword(port: number): string | undefined;
export function dropDatabase(bin: string, port: number, db: string): void;
export function otherRunsActive(bin: string, port: number): boolean;
