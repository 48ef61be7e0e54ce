// Types of postgres.mjs for the TypeScript tests that start a throwaway cluster.
export interface ClusterPaths {
  home: string;
  data: string;
  socket: string;
  log: string;
  portFile: string;
}
export interface StartedCluster {
  bin: string;
  port: number;
  /** `postgres://postgres@127.0.0.1:<port>` */
  base: string;
  adminUrl: string;
  startedHere: boolean;
}
export const DEFAULT_PGPORT: number;
export function findPgBinDir(): string | null;
export function clusterPathsIn(home: string): ClusterPaths;
export function clusterPaths(root: string): ClusterPaths;
export function startClusterIn(home: string, options?: { port?: number }): Promise<StartedCluster>;
export function startCluster(root: string): Promise<StartedCluster>;
export function controlClusterIn(home: string, action: 'start' | 'stop' | 'restart'): Promise<void>;
export function stopClusterIn(home: string): void;
export function stopCluster(root: string): void;
export function giveToServerUser(dir: string): void;
