import type { IncomingMessage } from 'node:http';
import { pinoHttp } from 'pino-http';
import type { Logger } from './logger';

/** Query parameters that carry a one-time secret: the OAuth callback's code and state, and any token. */
const secretQuery = /^(code|state|code_verifier|token|access_token|id_token|refresh_token|password|secret)$/i;

/** The path and query as logged: secret values replaced, everything else kept for finding a request again. */
export function loggableUrl(url: string): string {
  const mark = url.indexOf('?');
  if (mark < 0) return url;
  const params = new URLSearchParams(url.slice(mark + 1));
  for (const key of [...params.keys()]) {
    if (secretQuery.test(key)) params.set(key, '[redacted]');
  }
  const query = params.toString().replaceAll('%5Bredacted%5D', '[redacted]');
  return `${url.slice(0, mark)}${query ? `?${query}` : ''}`;
}

const logged = (req: IncomingMessage) => Boolean(req.url?.startsWith('/api') || req.url?.startsWith('/auth'));

/**
 * One short line per API or sign-in request: method, path, status and time. Headers are never written, so neither
 * the session cookie a sign-in sets nor anything a browser sends can end up in the log; failures are logged in full
 * by the error middleware.
 */
export function httpLogger(logger: Logger) {
  return pinoHttp({
    logger,
    autoLogging: { ignore: (req) => !logged(req) },
    serializers: {
      req: (req: { id?: unknown; method?: string; url?: string }) => ({
        id: req.id,
        method: req.method,
        url: loggableUrl(req.url ?? ''),
      }),
      res: (res: { statusCode?: number }) => ({ statusCode: res.statusCode }),
    },
    customLogLevel: (_req, res, error) => (error || res.statusCode >= 500 ? 'error' : 'info'),
    customSuccessMessage: (req, res) => `${req.method} ${res.statusCode}`,
    customErrorMessage: (req, res) => `${req.method} ${res.statusCode} failed`,
  });
}
