import pino from 'pino';

export function createLogger(level: string) {
  // Pretty output only for a person at a terminal; machines get JSON lines.
  const pretty = process.stdout.isTTY && process.env.NODE_ENV !== 'production';
  return pino({
    level,
    transport: pretty ? { target: 'pino-pretty', options: { colorize: true, ignore: 'pid,hostname' } } : undefined,
    redact: ['req.headers.cookie', 'req.headers.authorization'],
  });
}
export type Logger = ReturnType<typeof createLogger>;
