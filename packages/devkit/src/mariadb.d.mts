export const ROOT: string;
export interface DbConfig {
  profile: string;
  dataDir: string;
  socket: string;
  pidFile: string;
  logFile: string;
  host: string;
  port: number;
  database: string;
  user: string;
  password: string;
  external: boolean;
}
export function profileConfig(profile?: string, overrides?: Partial<DbConfig>): DbConfig;
export function rootSql(cfg: DbConfig, sql: string): string;
export function isRunning(cfg: DbConfig): boolean;
export function startServer(cfg: DbConfig, opts?: { quiet?: boolean }): Promise<DbConfig>;
export function provision(cfg: DbConfig, databases?: string[]): void;
export function recreateDatabase(cfg: DbConfig, db: string): void;
export function stopServer(cfg: DbConfig, opts?: { quiet?: boolean }): Promise<void>;
export function resetServer(cfg: DbConfig): Promise<void>;
export function dbEnv(cfg: DbConfig, database?: string): Record<string, string>;
