import { Router } from 'express';
import type { Sequelize } from 'sequelize';
import { isDbUp } from '../../db';

export function healthRouter(sequelize: Sequelize) {
  const r = Router();
  r.get('/', async (_req, res) => {
    const up = await isDbUp(sequelize);
    if (up) res.json({ data: { status: 'ok', db: 'up' } });
    else
      res.status(503).json({
        error: {
          code: 'DB_UNAVAILABLE',
          message: 'The club database is not reachable right now.',
        },
      });
  });
  // A trivial JSON route: the ceiling that benchmarks compare real routes with.
  r.get('/ping', (_req, res) => {
    res.json({ data: { pong: true } });
  });
  return r;
}
