import { describe, expect, it } from 'vitest';
import { isDbDown } from './error-handler';

describe('isDbDown', () => {
  it('treats a Galera node that is not ready (1047) and lost connections as the database being down', () => {
    expect(isDbDown({ parent: { errno: 1047, code: 'ER_UNKNOWN_COM_ERROR' } })).toBe(true);
    expect(isDbDown({ parent: { code: 'ECONNREFUSED' } })).toBe(true);
    expect(isDbDown({ parent: { errno: 1053, code: 'ER_SERVER_SHUTDOWN' } })).toBe(true);
    expect(isDbDown({ parent: { errno: 1927, code: 'ER_CONNECTION_KILLED' } })).toBe(true);
  });

  it('treats a pool this process has already closed (it is shutting down) as the database being down', () => {
    // The message Sequelize 6 throws from ConnectionManager.getConnection after sequelize.close().
    expect(
      isDbDown(
        new Error(
          'ConnectionManager.getConnection was called after the connection manager was closed!',
        ),
      ),
    ).toBe(true);
  });

  it('leaves query errors to the normal handling', () => {
    expect(isDbDown({ parent: { errno: 1062, code: 'ER_DUP_ENTRY' } })).toBe(false);
    expect(isDbDown(new Error('bad'))).toBe(false);
  });
});
