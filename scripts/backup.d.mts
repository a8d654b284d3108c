import type { DbConfig } from '../packages/devkit/src/mariadb.mjs';
export function dump(cfg: DbConfig, database: string, file?: string): string;
export function restore(cfg: DbConfig, file: string, database: string): void;
