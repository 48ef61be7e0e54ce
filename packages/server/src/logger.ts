import { pino, type Logger } from 'pino';

export type { Logger };

/** Structured JSON logs; secrets in headers are never written. */
export function createLogger(level: string): Logger {
  return pino({
    level,
    base: { service: 'sheaf-server' },
    redact: {
      paths: ['req.headers.cookie', 'req.headers.authorization', 'req.headers["x-csrf-token"]', 'res.headers["set-cookie"]'],
      censor: '[redacted]',
    },
  });
}
