import type { ChildProcess, SpawnSyncOptions } from 'node:child_process';
export function ensureDeps(): void;
export function run(
  cmd: string,
  args: string[],
  opts?: SpawnSyncOptions & { env?: Record<string, string> },
): number;
export function mustRun(
  cmd: string,
  args: string[],
  opts?: SpawnSyncOptions & { env?: Record<string, string> },
): void;
export function waitForPort(port: number, timeoutMs?: number): Promise<void>;
export function waitForHttp(url: string, timeoutMs?: number): Promise<void>;
export function startService(
  name: string,
  cmd: string,
  args: string[],
  env: Record<string, string>,
  opts?: { quiet?: boolean },
): ChildProcess;
export function stopService(child: ChildProcess): Promise<void>;
export const TSX: string;
