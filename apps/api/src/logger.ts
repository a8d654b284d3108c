import { pino } from 'pino';

export function createLogger(level: string) {
  return pino({
    level,
    redact: {
      paths: ['req.headers.cookie', 'req.headers["x-csrf-token"]', 'password', '*.password'],
      remove: true,
    },
  });
}
export type Logger = ReturnType<typeof createLogger>;
