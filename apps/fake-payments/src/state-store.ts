import { mkdirSync, readFileSync, renameSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { z } from 'zod';
import type { State } from './types';

const STATE_FILE = 'state.json';
const IDEMPOTENCY_TTL_MS = 24 * 60 * 60 * 1000;

// The snapshot is our own file; check its outline so a wrong or damaged file fails with a clear message.
const snapshotSchema = z.object({
  version: z.literal(1),
  customers: z.record(z.string(), z.unknown()),
  sessions: z.record(z.string(), z.unknown()),
  paymentIntents: z.record(z.string(), z.unknown()),
  charges: z.record(z.string(), z.unknown()),
  refunds: z.record(z.string(), z.unknown()),
  events: z.array(z.unknown()),
  deliveries: z.record(z.string(), z.unknown()),
  idempotency: z.record(z.string(), z.unknown()),
});

function emptyState(): State {
  return {
    version: 1,
    customers: {},
    sessions: {},
    paymentIntents: {},
    charges: {},
    refunds: {},
    events: [],
    deliveries: {},
    idempotency: {},
  };
}

/**
 * Holds the whole fake provider state in memory and writes it as one JSON snapshot
 * (`<dir>/state.json`, written to a temp file then renamed) after every change.
 */
export class StateStore {
  readonly state: State;
  private readonly file: string;

  private constructor(dir: string, state: State) {
    this.file = path.join(dir, STATE_FILE);
    this.state = state;
  }

  /**
   * Loads the snapshot under `dir` (creating the directory when missing) or starts empty.
   * Throws an Error naming the file when it exists but is not a snapshot of this fake.
   */
  static open(dir: string, nowMs: number): StateStore {
    mkdirSync(dir, { recursive: true });
    const file = path.join(dir, STATE_FILE);
    const store = new StateStore(dir, readSnapshot(file) ?? emptyState());
    store.pruneIdempotency(nowMs);
    return store;
  }

  /** Writes the snapshot atomically; synchronous so a response is only sent after it is on disk. */
  save(): void {
    const tmp = `${this.file}.${process.pid}.tmp`;
    writeFileSync(tmp, JSON.stringify(this.state));
    renameSync(tmp, this.file);
  }

  private pruneIdempotency(nowMs: number): void {
    for (const [key, record] of Object.entries(this.state.idempotency)) {
      if (nowMs - record.createdAt > IDEMPOTENCY_TTL_MS) delete this.state.idempotency[key];
    }
  }
}

function readSnapshot(file: string): State | undefined {
  let raw: string;
  try {
    raw = readFileSync(file, 'utf8');
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code === 'ENOENT') return undefined;
    throw error;
  }
  let json: unknown;
  try {
    json = JSON.parse(raw);
  } catch {
    throw new Error(`${file} is not valid JSON; move it away to start with an empty state`);
  }
  if (!snapshotSchema.safeParse(json).success) {
    throw new Error(`${file} is not a fake-payments snapshot; move it away to start empty`);
  }
  // The outline matched and only this program writes the file, so the entries have our shapes.
  return json as State;
}
