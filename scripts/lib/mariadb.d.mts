// Types for the MariaDB helpers, for the TypeScript tests that run a private server.
export const DB_USER: string;
export const DB_PASSWORD: string;
export type MariaDbPaths = { port: number; dir: string; dataDir: string; socket: string; pidFile: string; logFile: string };
export function mariaDbPaths(projectRoot: string): MariaDbPaths;
export function databaseUrl(paths: MariaDbPaths, database: string): string;
export function startMariaDb(
  projectRoot: string,
  databases: string[],
  log?: (line: string) => void,
  options?: { serverArgs?: string[] },
): Promise<{ paths: MariaDbPaths; startedHere: boolean }>;
export function rootSql(paths: MariaDbPaths, statements: string): string;
export function stopMariaDb(projectRoot: string, log?: (line: string) => void): Promise<void>;
