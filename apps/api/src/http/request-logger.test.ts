import { Writable } from 'node:stream';
import express from 'express';
import { pino } from 'pino';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { requestLogger } from './request-logger';

/** An app whose routes answer 200, 404, 500 or slowly, logging at `level` into the returned lines. */
function appAt(level: string, slowMs = 1000) {
  const lines: Record<string, unknown>[] = [];
  const sink = new Writable({
    write(chunk: Buffer, _enc, done) {
      for (const l of chunk.toString().split('\n').filter(Boolean))
        lines.push(JSON.parse(l) as Record<string, unknown>);
      done();
    },
  });
  const app = express();
  app.use(requestLogger(pino({ level }, sink), slowMs));
  app.get('/ok', (_req, res) => void res.json({ ok: true }));
  app.get('/missing', (_req, res) => void res.status(404).json({}));
  app.get('/broken', (_req, res) => void res.status(500).json({}));
  app.get('/slow', (_req, res) => void setTimeout(() => res.json({}), 40));
  return { app, lines };
}
const settle = () => new Promise((r) => setTimeout(r, 20));

describe('requestLogger', () => {
  it('at warn, writes only failed requests, by method and path without the query', async () => {
    const { app, lines } = appAt('warn');
    await request(app).get('/ok');
    await request(app).get('/missing');
    await request(app).get('/broken?token=secret');
    await settle();
    expect(lines).toHaveLength(1);
    expect(lines[0]).toMatchObject({
      level: 50,
      msg: 'request failed',
      req: { method: 'GET', path: '/broken' },
      res: { statusCode: 500 },
    });
    expect(JSON.stringify(lines[0])).not.toContain('secret');
  });

  it('at warn, writes a slow request as a warning', async () => {
    const { app, lines } = appAt('warn', 30);
    await request(app).get('/slow');
    await request(app).get('/ok');
    await settle();
    expect(lines).toHaveLength(1);
    expect(lines[0]).toMatchObject({ level: 40, msg: 'slow request', req: { path: '/slow' } });
  });

  it('at info, writes a line per request through pino-http (4xx as info)', async () => {
    const { app, lines } = appAt('info');
    await request(app).get('/ok');
    await request(app).get('/missing');
    await settle();
    expect(lines.map((l) => l.level)).toEqual([30]);
    expect(lines[0]).toMatchObject({ res: { statusCode: 404 } });
  });
});
