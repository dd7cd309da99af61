import pino, { type DestinationStream } from 'pino';

/** A second line of defence: the request logger's own serializers never emit headers, but nothing else may either. */
const secretPaths = [
  'req.headers.cookie',
  'req.headers.authorization',
  'res.headers["set-cookie"]',
  'headers.cookie',
  'headers["set-cookie"]',
];

/** `destination` lets a test read what would have been written. */
export function createLogger(level: string, destination?: DestinationStream) {
  const redact = { paths: secretPaths, censor: '[redacted]' };
  if (destination) return pino({ level, redact }, destination);
  // Pretty output only for a person at a terminal; machines get JSON lines.
  const pretty = process.stdout.isTTY && process.env.NODE_ENV !== 'production';
  return pino({
    level,
    transport: pretty ? { target: 'pino-pretty', options: { colorize: true, ignore: 'pid,hostname' } } : undefined,
    redact,
  });
}
export type Logger = ReturnType<typeof createLogger>;
