import { randomUUID } from 'node:crypto';
import type { IncomingMessage, ServerResponse } from 'node:http';
import { escapeHtml } from '../lib/html.js';

/** A refusal in the shape the AWS SDK parses, so callers see a typed S3ServiceException with this code. */
export class S3Refusal extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
  ) {
    super(message);
  }
}

export function sendS3Error(req: IncomingMessage, res: ServerResponse, refusal: S3Refusal): void {
  const resource = (req.url ?? '/').split('?')[0];
  const requestId = randomUUID();
  const xml =
    '<?xml version="1.0" encoding="UTF-8"?>\n' +
    `<Error><Code>${escapeHtml(refusal.code)}</Code><Message>${escapeHtml(refusal.message)}</Message>` +
    `<Resource>${escapeHtml(resource)}</Resource><RequestId>${requestId}</RequestId></Error>`;
  if (res.headersSent) {
    res.destroy();
    return;
  }
  res.statusCode = refusal.status;
  res.setHeader('Content-Type', 'application/xml');
  res.setHeader('x-amz-request-id', requestId);
  // A HEAD answer carries no body, but the status and code header still tell the SDK what went wrong.
  if (req.method === 'HEAD') {
    res.setHeader('x-amz-error-code', refusal.code);
    res.end();
    return;
  }
  res.setHeader('Content-Length', Buffer.byteLength(xml));
  res.end(xml);
}
