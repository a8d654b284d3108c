import { mkdtemp, readdir, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import nodemailer from 'nodemailer';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import type { MessageDto } from './message-store';
import { startFakeMail } from './server';
import type { FakeMail } from './server';

let dataDir: string;
let mail: FakeMail;

beforeEach(async () => {
  dataDir = await mkdtemp(path.join(tmpdir(), 'fake-mail-'));
  mail = await startFakeMail({ smtpPort: 0, httpPort: 0, dataDir });
});

afterEach(async () => {
  await mail.close();
  await rm(dataDir, { recursive: true, force: true });
});

interface SendInput {
  to: string;
  subject: string;
  text?: string;
  html?: string;
  bcc?: string;
  messageId?: string;
  auth?: { user: string; pass: string };
}

async function send(input: SendInput): Promise<void> {
  const transport = nodemailer.createTransport({
    host: '127.0.0.1',
    port: mail.smtpPort,
    secure: false,
    ignoreTLS: true,
    ...(input.auth ? { auth: input.auth } : {}),
  });
  await transport.sendMail({
    from: 'Harbour Club <secretary@example.test>',
    to: input.to,
    bcc: input.bcc,
    subject: input.subject,
    text: input.text ?? 'plain body',
    html: input.html,
    messageId: input.messageId,
  });
  transport.close();
}

async function getJson<T>(
  pathAndQuery: string,
  init?: RequestInit,
): Promise<{ status: number; body: T }> {
  const res = await fetch(mail.httpUrl + pathAndQuery, init);
  return { status: res.status, body: (await res.json()) as T };
}

const listMessages = async (query = '') =>
  (await getJson<{ data: MessageDto[] }>(`/api/messages${query}`)).body.data;

describe('startFakeMail', () => {
  it('binds real ports when asked for port 0', () => {
    expect(mail.smtpPort).toBeGreaterThan(0);
    expect(mail.httpPort).toBeGreaterThan(0);
    expect(mail.httpPort).not.toBe(mail.smtpPort);
  });

  it('rejects when the HTTP port is already taken', async () => {
    await expect(startFakeMail({ smtpPort: 0, httpPort: mail.httpPort, dataDir })).rejects.toThrow(
      /EADDRINUSE/,
    );
  });
});

describe('SMTP → GET /api/messages', () => {
  it('stores a message sent through nodemailer with its parts', async () => {
    await send({
      to: 'Member <Member@Example.test>',
      subject: 'Verify your e-mail',
      text: 'Code 123',
      html: '<p>Code <b>123</b></p>',
    });

    const [message] = await listMessages('?to=member@example.test');
    expect(message).toMatchObject({
      from: '"Harbour Club" <secretary@example.test>',
      to: ['member@example.test'],
      subject: 'Verify your e-mail',
      html: '<p>Code <b>123</b></p>',
    });
    expect(message?.text.trim()).toBe('Code 123');
    expect(Date.parse(message?.receivedAt ?? '')).toBeGreaterThan(Date.now() - 60_000);
    expect(await readdir(dataDir)).toEqual([`${message?.id}.json`]);
  });

  it('keeps the sender’s Message-ID, so a resent message can be told apart from a new one', async () => {
    await send({ to: 'a@example.test', subject: 'First', messageId: '<outbox-7@club.test>' });
    await send({ to: 'a@example.test', subject: 'Second' });
    const [second, first] = await listMessages();
    expect(first?.messageId).toBe('outbox-7@club.test');
    expect(second?.messageId).toMatch(/^[^<>\s]+@[^<>\s]+$/);
    expect(second?.messageId).not.toBe(first?.messageId);
  });

  it('accepts a client that offers credentials and records Bcc recipients', async () => {
    await send({
      to: 'a@example.test',
      bcc: 'hidden@example.test',
      subject: 'Dues',
      auth: { user: 'x', pass: 'y' },
    });
    const [message] = await listMessages('?to=hidden@example.test');
    expect(message?.to.sort()).toEqual(['a@example.test', 'hidden@example.test']);
    expect(message?.html).toBeNull();
  });

  it('filters by recipient and subject substring, newest first', async () => {
    await send({ to: 'a@example.test', subject: 'Reset your password' });
    await send({ to: 'b@example.test', subject: 'Dues reminder' });
    await send({ to: 'a@example.test', subject: 'Dues receipt' });

    expect((await listMessages()).map((m) => m.subject)).toEqual([
      'Dues receipt',
      'Dues reminder',
      'Reset your password',
    ]);
    expect((await listMessages('?to=A@example.test')).map((m) => m.subject)).toEqual([
      'Dues receipt',
      'Reset your password',
    ]);
    expect((await listMessages('?subject=dues')).map((m) => m.subject)).toEqual([
      'Dues receipt',
      'Dues reminder',
    ]);
    expect((await listMessages('?to=a@example.test&subject=DUES')).map((m) => m.subject)).toEqual([
      'Dues receipt',
    ]);
    expect(await listMessages('?to=nobody@example.test')).toEqual([]);
  });

  it('answers 400 with a clear error for a malformed filter', async () => {
    const res = await getJson<{ error: { code: string } }>('/api/messages?to=');
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('VALIDATION_FAILED');
  });
});

describe('GET /api/messages/:id', () => {
  it('returns one message and 404 for an unknown id', async () => {
    await send({ to: 'a@example.test', subject: 'One' });
    const [listed] = await listMessages();
    const found = await getJson<{ data: MessageDto }>(`/api/messages/${listed?.id}`);
    expect(found.body.data).toEqual(listed);

    const missing = await getJson<{ error: { code: string } }>('/api/messages/000-none');
    expect(missing.status).toBe(404);
    expect(missing.body.error.code).toBe('NOT_FOUND');
  });
});

describe('persistence and DELETE /api/messages', () => {
  it('keeps messages across a restart', async () => {
    await send({ to: 'a@example.test', subject: 'Before restart' });
    await mail.close();
    mail = await startFakeMail({ smtpPort: 0, httpPort: 0, dataDir });
    expect((await listMessages()).map((m) => m.subject)).toEqual(['Before restart']);
  });

  it('clears every message, on disk too', async () => {
    await send({ to: 'a@example.test', subject: 'First' });
    await send({ to: 'a@example.test', subject: 'Second' });
    const res = await getJson<{ data: { deleted: number } }>('/api/messages', { method: 'DELETE' });
    expect(res.body.data.deleted).toBe(2);
    expect(await listMessages()).toEqual([]);

    await mail.close();
    mail = await startFakeMail({ smtpPort: 0, httpPort: 0, dataDir });
    expect(await listMessages()).toEqual([]);
  });
});

describe('inbox pages', () => {
  it('lists messages and shows the HTML part escaped inside a sandboxed frame', async () => {
    await send({
      to: 'a@example.test',
      subject: 'Welcome <aboard>',
      html: '<p onclick="x()">Hi & welcome</p>',
    });
    const inbox = await (await fetch(`${mail.httpUrl}/`)).text();
    expect(inbox).toContain('Welcome &lt;aboard&gt;');
    const [message] = await listMessages();

    const page = await fetch(`${mail.httpUrl}/messages/${message?.id}`);
    const html = await page.text();
    expect(page.headers.get('content-security-policy')).toContain("default-src 'none'");
    expect(html).toMatch(
      /<iframe[^>]* sandbox srcdoc="&lt;p onclick=&quot;x\(\)&quot;&gt;Hi &amp; welcome/,
    );
    expect(html).not.toContain('<p onclick');
  });

  it('answers an unknown message page with 404', async () => {
    const res = await fetch(`${mail.httpUrl}/messages/nope`);
    expect(res.status).toBe(404);
    expect(await res.text()).toContain('Message not found');
  });
});

describe('GET /api/health', () => {
  it('reports ok', async () => {
    const res = await getJson<{ data: { status: string } }>('/api/health');
    expect(res.body.data.status).toBe('ok');
  });
});
