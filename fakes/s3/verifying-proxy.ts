import { createHash, timingSafeEqual } from 'node:crypto';
import {
  Agent,
  createServer,
  request as httpRequest,
  type IncomingMessage,
  type OutgoingHttpHeaders,
  type Server,
  type ServerResponse,
} from 'node:http';
import { answerPreflight, applyCorsHeaders } from './cors.js';
import { S3Refusal, sendS3Error } from './s3-error.js';
import type { UsedUploadSignatures } from './used-upload-signatures.js';
import { verifySignature, type Credentials, type VerifiedRequest } from './verify-signature.js';

export interface ProxyOptions {
  credentials: Credentials;
  allowedOrigins: string[];
  upstreamPort: number;
  usedSignatures: UsedUploadSignatures;
  agent: Agent;
}

// Hashed payloads can only be checked after the last byte, and s3rver would already have stored a forged object
// by then, so such bodies are held here first. Browser uploads are UNSIGNED-PAYLOAD and stream straight through.
const maxHashedBodyBytes = 64 * 1024 * 1024;

/** The public S3 endpoint: checks every request the way S3 would, then hands it to s3rver on loopback. */
export function createVerifyingProxy(options: ProxyOptions): Server {
  return createServer((req, res) => {
    handle(req, res, options).catch((error: unknown) => {
      const refusal = error instanceof S3Refusal ? error : new S3Refusal(500, 'InternalError', String(error));
      sendS3Error(req, res, refusal);
      req.resume();
    });
  });
}

async function handle(req: IncomingMessage, res: ServerResponse, options: ProxyOptions): Promise<void> {
  applyCorsHeaders(req, res, options.allowedOrigins);
  if (req.method === 'OPTIONS') return answerPreflight(req, res, options.allowedOrigins);
  const verified = await verifySignature(req, options.credentials);
  const isUpload = verified.mode === 'presigned' && req.method === 'PUT';
  if (isUpload) {
    const unsigned = ['content-type', 'content-length'].filter((name) => !verified.signedHeaders.includes(name));
    if (unsigned.length > 0) {
      throw new S3Refusal(
        403,
        'AccessDenied',
        `Upload URLs must sign ${unsigned.join(' and ')} (presign with signableHeaders: new Set(['content-type']) and a ContentLength).`,
      );
    }
    if (!options.usedSignatures.claim(verified.signature)) {
      throw new S3Refusal(403, 'AccessDenied', 'This upload URL has already been used.');
    }
  }
  try {
    const body = /^[0-9a-f]{64}$/.test(verified.payloadHash) ? await readHashedBody(req, verified.payloadHash) : req;
    await forward(req, res, body, verified, options);
  } catch (error) {
    if (isUpload) options.usedSignatures.release(verified.signature);
    throw error;
  }
}

function forward(
  req: IncomingMessage,
  res: ServerResponse,
  body: IncomingMessage | Buffer,
  verified: VerifiedRequest,
  options: ProxyOptions,
): Promise<void> {
  const headers: OutgoingHttpHeaders = { ...req.headers, host: `127.0.0.1:${options.upstreamPort}` };
  // Our layer owns CORS and continue handling; s3rver should only see a plain signed-off request.
  delete headers.origin;
  delete headers.expect;
  if (Buffer.isBuffer(body)) headers['content-length'] = String(body.length);
  return new Promise((resolve, reject) => {
    const upstream = httpRequest({
      host: '127.0.0.1',
      port: options.upstreamPort,
      method: req.method,
      path: req.url,
      headers,
      agent: options.agent,
    });
    upstream.on('error', (error) =>
      reject(new S3Refusal(502, 'InternalError', `Storage backend failed: ${error.message}`)),
    );
    upstream.on('response', (answer) => {
      const status = answer.statusCode ?? 502;
      const settle = async () => {
        if (verified.mode === 'presigned' && req.method === 'PUT') {
          if (status < 300)
            await options.usedSignatures.markSpent(verified.signature, verified.expiresAt ?? Date.now());
          else options.usedSignatures.release(verified.signature);
        }
        const passed = Object.entries(answer.headers).filter(([name]) => !/^(access-control-|vary$)/.test(name));
        res.writeHead(status, Object.fromEntries(passed));
        answer.pipe(res);
        answer.on('end', () => resolve());
        answer.on('error', reject);
      };
      settle().catch(reject);
    });
    if (Buffer.isBuffer(body)) {
      upstream.end(body);
    } else {
      body.pipe(upstream);
      body.on('aborted', () => upstream.destroy());
    }
  });
}

async function readHashedBody(req: IncomingMessage, expectedHex: string): Promise<Buffer> {
  const chunks: Buffer[] = [];
  let size = 0;
  const hash = createHash('sha256');
  for await (const chunk of req as AsyncIterable<Buffer>) {
    size += chunk.length;
    if (size > maxHashedBodyBytes)
      throw new S3Refusal(
        400,
        'EntityTooLarge',
        'A body signed by its hash may be at most 64 MiB here; sign it as UNSIGNED-PAYLOAD to stream it.',
      );
    hash.update(chunk);
    chunks.push(chunk);
  }
  const actual = hash.digest();
  if (!timingSafeEqual(actual, Buffer.from(expectedHex, 'hex'))) {
    throw new S3Refusal(
      400,
      'XAmzContentSHA256Mismatch',
      "The provided 'x-amz-content-sha256' header does not match what was computed.",
    );
  }
  return Buffer.concat(chunks);
}
