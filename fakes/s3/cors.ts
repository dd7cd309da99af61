import type { IncomingMessage, ServerResponse } from 'node:http';
import { S3Refusal } from './s3-error.js';

const allowedMethods = ['GET', 'PUT', 'HEAD'];

/**
 * Answers a preflight for an allowed page origin, or throws the refusal S3 gives.
 * The browser PUTs straight to a presigned URL from the app's page, so this is what makes uploads possible at all.
 */
export function answerPreflight(req: IncomingMessage, res: ServerResponse, allowedOrigins: string[]): void {
  const origin = req.headers.origin;
  const method = String(req.headers['access-control-request-method'] ?? '').toUpperCase();
  if (!origin || !method) {
    throw new S3Refusal(400, 'BadRequest', 'A preflight needs Origin and Access-Control-Request-Method headers.');
  }
  if (!allowedOrigins.includes(origin) || !allowedMethods.includes(method)) {
    throw new S3Refusal(403, 'AccessForbidden', 'CORSResponse: This CORS request is not allowed.');
  }
  const requestedHeaders = req.headers['access-control-request-headers'];
  res.statusCode = 200;
  res.setHeader('Access-Control-Allow-Origin', origin);
  res.setHeader('Access-Control-Allow-Methods', allowedMethods.join(', '));
  // Echoing the asked-for headers allows every header, like "*", and also works for credentialed requests.
  res.setHeader('Access-Control-Allow-Headers', requestedHeaders ? String(requestedHeaders) : '*');
  res.setHeader('Access-Control-Expose-Headers', 'ETag');
  res.setHeader('Access-Control-Max-Age', '600');
  res.setHeader('Vary', 'Origin, Access-Control-Request-Headers, Access-Control-Request-Method');
  res.setHeader('Content-Length', '0');
  res.end();
}

/** Adds CORS headers to an actual response (errors included, so the page can read why an upload failed). */
export function applyCorsHeaders(req: IncomingMessage, res: ServerResponse, allowedOrigins: string[]): void {
  res.setHeader('Vary', 'Origin');
  const origin = req.headers.origin;
  if (!origin || !allowedOrigins.includes(origin)) return;
  res.setHeader('Access-Control-Allow-Origin', origin);
  res.setHeader('Access-Control-Expose-Headers', 'ETag');
}
