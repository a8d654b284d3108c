import { randomBytes } from 'node:crypto';
import { mkdir, readdir, readFile, rename, rm, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { z } from 'zod';

export const messageDtoSchema = z.object({
  id: z.string().regex(/^[a-z0-9-]+$/),
  receivedAt: z.iso.datetime(),
  from: z.string(),
  to: z.array(z.string()),
  subject: z.string(),
  text: z.string(),
  html: z.string().nullable(),
  /** The sender's Message-ID header (without angle brackets), so a test can tell a resend from a new message. */
  messageId: z.string().nullable().default(null),
});

/** One stored e-mail as the JSON API returns it. */
export type MessageDto = z.infer<typeof messageDtoSchema>;

export type NewMessage = Omit<MessageDto, 'id' | 'receivedAt' | 'messageId'> & {
  messageId?: string | null;
};

export interface MessageFilter {
  /** Exact recipient address, compared case-insensitively. */
  to?: string;
  /** Substring of the subject, compared case-insensitively. */
  subject?: string;
}

const FILE_SUFFIX = '.json';

/**
 * Keeps received messages in memory and as one JSON file each under `dir`,
 * so a restart of the sink loses nothing.
 */
export class MessageStore {
  private readonly messages = new Map<string, MessageDto>();
  private sequence = 0;

  private constructor(private readonly dir: string) {}

  /** Opens (creating if needed) the store directory and loads every message file in it. */
  static async open(dir: string): Promise<MessageStore> {
    await mkdir(dir, { recursive: true });
    const store = new MessageStore(dir);
    const names = (await readdir(dir)).filter((name) => name.endsWith(FILE_SUFFIX));
    for (const name of names) {
      const raw = await readFile(path.join(dir, name), 'utf8');
      const parsed = messageDtoSchema.safeParse(safeJson(raw));
      // A file that is not a message (hand-edited, half-written by an old version) is skipped.
      if (parsed.success) store.messages.set(parsed.data.id, parsed.data);
    }
    return store;
  }

  /** Stores a message and returns it with its new id and receive time. */
  async add(message: NewMessage, receivedAt = new Date()): Promise<MessageDto> {
    const dto: MessageDto = {
      id: this.nextId(receivedAt),
      receivedAt: receivedAt.toISOString(),
      ...message,
      messageId: message.messageId ?? null,
    };
    const file = path.join(this.dir, dto.id + FILE_SUFFIX);
    const tmp = `${file}.${process.pid}.tmp`;
    await writeFile(tmp, JSON.stringify(dto, null, 2));
    await rename(tmp, file);
    this.messages.set(dto.id, dto);
    return dto;
  }

  /** Messages matching the filter, newest first. */
  list(filter: MessageFilter = {}): MessageDto[] {
    const to = filter.to?.trim().toLowerCase();
    const subject = filter.subject?.toLowerCase();
    return [...this.messages.values()]
      .filter((m) => !to || m.to.some((address) => address.toLowerCase() === to))
      .filter((m) => !subject || m.subject.toLowerCase().includes(subject))
      .sort((a, b) => (a.id < b.id ? 1 : a.id > b.id ? -1 : 0));
  }

  get(id: string): MessageDto | undefined {
    return this.messages.get(id);
  }

  /** Deletes every message, in memory and on disk. Returns how many were removed. */
  async clear(): Promise<number> {
    const ids = [...this.messages.keys()];
    await Promise.all(ids.map((id) => rm(path.join(this.dir, id + FILE_SUFFIX), { force: true })));
    this.messages.clear();
    return ids.length;
  }

  /** Ids sort by time, then by arrival order within one millisecond. */
  private nextId(receivedAt: Date): string {
    this.sequence = (this.sequence + 1) % 1_000_000;
    const time = receivedAt.getTime().toString().padStart(15, '0');
    const seq = this.sequence.toString().padStart(6, '0');
    return `${time}-${seq}-${randomBytes(3).toString('hex')}`;
  }
}

function safeJson(raw: string): unknown {
  try {
    return JSON.parse(raw);
  } catch {
    return undefined;
  }
}
