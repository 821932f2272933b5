import pino from 'pino';

/** Structured JSON logs. Request bodies are never logged; these paths are redacted wherever they appear. */
export function createLogger(level: string) {
  return pino({
    level,
    redact: { paths: ['req.headers.cookie', 'req.headers["x-xsrf-token"]', 'password', '*.password', 'passwordHash'], remove: true },
  });
}

export type Logger = ReturnType<typeof createLogger>;
