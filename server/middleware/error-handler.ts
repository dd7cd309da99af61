import { fieldLabelsOf } from '@shared/contracts/field-labels';
import type { ErrorRequestHandler } from 'express';
import { databaseUnavailable, isDatabaseUnavailable } from '../lib/db-unavailable';
import { AppError } from '../lib/errors';
import { loggableUrl } from '../lib/http-logger';
import type { Logger } from '../lib/logger';

// Unique keys a person can collide with by sending the same thing twice at once, and the field each one names.
const uniqueFields: Record<string, string> = {
  users_email_key: 'email',
  jurisdictions_slug_unique: 'name',
  as_built_sets_crew_idempotency_key: 'Idempotency-Key',
};

/** PostgreSQL's unique_violation (23505), straight from pg or wrapped by Drizzle as the cause. */
function uniqueViolation(error: unknown): { constraint?: string } | null {
  for (
    let e = error as { code?: string; cause?: unknown; constraint?: string } | undefined, i = 0;
    e && i < 3;
    e = e.cause as typeof e, i += 1
  ) {
    if (e.code === '23505') return { constraint: e.constraint };
  }
  return null;
}

interface BodyParserError {
  type?: string;
  status?: number;
  expose?: boolean;
}

/** The one place errors become responses: `{ error: { code, message, fields?, labels? } }`. */
export function errorHandler(logger: Logger): ErrorRequestHandler {
  return (error, req, res, _next) => {
    if (res.headersSent) return;
    if (error instanceof AppError) {
      // Every field named in an error comes with its label, so the client writes "Permit expires on", not the key.
      const labels = error.fields ? { ...fieldLabelsOf(error.fields), ...error.labels } : undefined;
      res
        .status(error.status)
        .json({ error: { code: error.code, message: error.message, fields: error.fields, labels } });
      return;
    }
    const parserError = error as BodyParserError;
    if (parserError.type === 'entity.parse.failed') {
      res.status(400).json({
        error: {
          code: 'malformed_json',
          message: 'The request body is not valid JSON.',
          fields: { '(body)': 'not valid JSON' },
        },
      });
      return;
    }
    if (parserError.type === 'entity.too.large') {
      res.status(413).json({ error: { code: 'too_large', message: 'The request body is too large.' } });
      return;
    }
    // The router decodes path parameters; a broken %-escape in the address (such as "%E0%A4%A") cannot be decoded.
    if (error instanceof URIError && parserError.status === 400) {
      res.status(400).json({
        error: {
          code: 'bad_path',
          message: 'The address holds a broken %-escape.',
          fields: { '(path)': 'not a valid address' },
        },
      });
      return;
    }
    if (parserError.expose && parserError.status && parserError.status < 500) {
      res
        .status(parserError.status)
        .json({ error: { code: 'bad_request', message: String((error as Error).message) } });
      return;
    }
    // The services check before they insert; two identical requests at the same moment can still both pass the check.
    const duplicate = uniqueViolation(error);
    if (duplicate) {
      const field = duplicate.constraint ? uniqueFields[duplicate.constraint] : undefined;
      res.status(409).json({
        error: {
          code: 'already_exists',
          message: 'That already exists: it may have been added a moment ago. Reload to see it.',
          ...(field ? { fields: { [field]: 'is already taken' } } : {}),
        },
      });
      return;
    }
    // A restart, failover or frozen server: say so plainly and let the client retry, instead of a 500.
    if (isDatabaseUnavailable(error)) {
      const unavailable = databaseUnavailable();
      logger.warn({ err: error, url: loggableUrl(req.originalUrl) }, 'database unavailable');
      res
        .status(503)
        .set('Retry-After', '5')
        .json({ error: { code: unavailable.code, message: unavailable.message } });
      return;
    }
    logger.error({ err: error, url: loggableUrl(req.originalUrl) }, 'unhandled error');
    res.status(500).json({
      error: {
        code: 'internal',
        message: 'Something went wrong on our side. Nothing you sent was lost; please try again.',
      },
    });
  };
}
