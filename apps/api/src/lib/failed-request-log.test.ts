import express from 'express';
import pino from 'pino';
import { Writable } from 'node:stream';
import { describe, expect, it } from 'vitest';
import { failedRequestLog } from './failed-request-log';

function appWithLog() {
  const lines: Array<Record<string, unknown>> = [];
  const sink = new Writable({
    write(chunk: Buffer, _enc, done) {
      lines.push(JSON.parse(chunk.toString()) as Record<string, unknown>);
      done();
    },
  });
  const app = express();
  app.use(failedRequestLog(pino({ level: 'warn' }, sink)));
  app.get('/ok', (_req, res) => void res.json({ ok: true }));
  app.get('/missing', (_req, res) => void res.status(404).json({}));
  app.get('/broken', (_req, res) => void res.status(503).json({}));
  return { app, lines };
}

async function call(app: express.Express, path: string) {
  const server = app.listen(0);
  await new Promise((r) => server.once('listening', r));
  const { port } = server.address() as { port: number };
  const res = await fetch(`http://127.0.0.1:${port}${path}?secret=1`);
  await res.text();
  await new Promise((r) => setTimeout(r, 20));
  server.close();
  return res.status;
}

describe('failed-request log', () => {
  it('logs a 5xx answer with method, path (no query) and status, and nothing for 2xx or 4xx', async () => {
    const { app, lines } = appWithLog();
    expect(await call(app, '/ok')).toBe(200);
    expect(await call(app, '/missing')).toBe(404);
    expect(lines).toHaveLength(0);
    expect(await call(app, '/broken')).toBe(503);
    expect(lines).toHaveLength(1);
    expect(lines[0]).toMatchObject({
      level: 50,
      msg: 'request failed',
      req: { method: 'GET', url: '/broken' },
      res: { statusCode: 503 },
    });
  });
});
