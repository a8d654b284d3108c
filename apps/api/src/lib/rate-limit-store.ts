import { createHash } from 'node:crypto';
import { QueryTypes, type Sequelize } from 'sequelize';
import type { ClientRateLimitInfo, Options, Store } from 'express-rate-limit';

/**
 * express-rate-limit counters in MariaDB (`rate_limit_hits`), so every API process behind a load balancer counts
 * the same attempts. One row per limiter prefix and key (hashed: keys carry e-mail addresses); a row whose window
 * has passed starts again at 1. Expired rows are swept now and then by the increments themselves.
 */
export class SequelizeRateLimitStore implements Store {
  windowMs = 60_000;
  /** The counters are shared, not per process. */
  localKeys = false;
  private calls = 0;

  constructor(
    private readonly sequelize: Sequelize,
    readonly prefix: string,
  ) {}

  init(options: Options) {
    this.windowMs = options.windowMs;
  }

  private hash(key: string) {
    return createHash('sha256').update(`${this.prefix}\u0000${key}`).digest('hex');
  }

  async get(key: string): Promise<ClientRateLimitInfo | undefined> {
    const rows = await this.sequelize.query<{ hits: number; reset_at: Date }>(
      'SELECT hits, reset_at FROM rate_limit_hits WHERE key_hash = :k AND reset_at > NOW(3)',
      { replacements: { k: this.hash(key) }, type: QueryTypes.SELECT },
    );
    const r = rows[0];
    return r ? { totalHits: r.hits, resetTime: new Date(r.reset_at) } : undefined;
  }

  async increment(key: string): Promise<ClientRateLimitInfo> {
    const k = this.hash(key);
    if (++this.calls % 200 === 0) void this.sweep().catch(() => undefined);
    await this.sequelize.query(
      `INSERT INTO rate_limit_hits (key_hash, hits, reset_at) VALUES (:k, 1, NOW(3) + INTERVAL :us MICROSECOND)
       ON DUPLICATE KEY UPDATE
         hits = IF(reset_at <= NOW(3), 1, hits + 1),
         reset_at = IF(reset_at <= NOW(3), VALUES(reset_at), reset_at)`,
      { replacements: { k, us: this.windowMs * 1000 } },
    );
    const info = await this.get(key);
    return info ?? { totalHits: 1, resetTime: new Date(Date.now() + this.windowMs) };
  }

  async decrement(key: string): Promise<void> {
    await this.sequelize.query(
      'UPDATE rate_limit_hits SET hits = hits - 1 WHERE key_hash = :k AND hits > 0',
      { replacements: { k: this.hash(key) } },
    );
  }

  async resetKey(key: string): Promise<void> {
    await this.sequelize.query('DELETE FROM rate_limit_hits WHERE key_hash = :k', {
      replacements: { k: this.hash(key) },
    });
  }

  /** Deletes rows whose window has passed; returns how many. */
  async sweep(): Promise<number> {
    const n: unknown = await this.sequelize.query(
      'DELETE FROM rate_limit_hits WHERE reset_at <= NOW(3) - INTERVAL 1 MINUTE',
      { type: QueryTypes.BULKDELETE },
    );
    return typeof n === 'number' ? n : 0;
  }
}
