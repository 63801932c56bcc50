import { pino, type Logger } from 'pino';

/** Passwords, tokens and cookies never reach the log. */
export function createLogger(level: string): Logger {
  return pino({
    level,
    redact: {
      paths: ['req.headers.cookie', 'req.headers.authorization', 'res.headers["set-cookie"]', '*.password', '*.token'],
      censor: '[redacted]',
    },
  });
}
