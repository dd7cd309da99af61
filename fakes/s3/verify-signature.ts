import { timingSafeEqual } from 'node:crypto';
import type { IncomingMessage } from 'node:http';
import { Sha256 } from '@aws-crypto/sha256-js';
import { SignatureV4 } from '@smithy/signature-v4';
import { S3Refusal } from './s3-error.js';

export interface Credentials {
  accessKeyId: string;
  secretAccessKey: string;
  region: string;
}

export interface VerifiedRequest {
  mode: 'header' | 'presigned';
  signature: string;
  signedHeaders: string[];
  /** The x-amz-content-sha256 the signer committed to: a hex digest, or UNSIGNED-PAYLOAD. */
  payloadHash: string;
  /** When a presigned URL stops working, in ms since the epoch. */
  expiresAt?: number;
}

interface Scope {
  accessKeyId: string;
  date: string;
  region: string;
  service: string;
}

type Query = Record<string, string | string[]>;
type SignerRequest = Parameters<SignatureV4['presign']>[0];

const allowedClockSkewMs = 15 * 60 * 1000;
const maxPresignSeconds = 7 * 24 * 3600;
const presignParams = [
  'X-Amz-Algorithm',
  'X-Amz-Credential',
  'X-Amz-Date',
  'X-Amz-Expires',
  'X-Amz-SignedHeaders',
  'X-Amz-Signature',
  'X-Amz-Security-Token',
];
const mismatch = (why: string) =>
  new S3Refusal(
    403,
    'SignatureDoesNotMatch',
    `The request signature we calculated does not match the signature you provided. ${why}`,
  );

/** Recomputes SigV4 for a header-signed or presigned request with the SDK's own signer; throws an S3Refusal. */
export async function verifySignature(
  req: IncomingMessage,
  creds: Credentials,
  now = Date.now(),
): Promise<VerifiedRequest> {
  const [path, rawQuery = ''] = (req.url ?? '/').split(/\?(.*)/s);
  const query = parseQuery(rawQuery);
  const signer = new SignatureV4({
    credentials: creds,
    region: creds.region,
    service: 's3',
    sha256: Sha256,
    uriEscapePath: false,
    applyChecksum: false,
  });
  if (req.headers.authorization) return verifyHeaderSigned(req, path, query, signer, creds, now);
  if ('X-Amz-Signature' in query) return verifyPresigned(req, path, query, signer, creds, now);
  throw new S3Refusal(403, 'AccessDenied', 'Access Denied: the request carries no signature.');
}

async function verifyHeaderSigned(
  req: IncomingMessage,
  path: string,
  query: Query,
  signer: SignatureV4,
  creds: Credentials,
  now: number,
) {
  const match = /^AWS4-HMAC-SHA256 Credential=([^,]+),\s*SignedHeaders=([^,]+),\s*Signature=([0-9a-f]{64})$/.exec(
    String(req.headers.authorization),
  );
  if (!match) throw new S3Refusal(400, 'AuthorizationHeaderMalformed', 'The authorization header is malformed.');
  const [, credential, signedHeaderList, provided] = match;
  const scope = checkScope(credential, creds);
  const signingDate = parseAmzDate(String(req.headers['x-amz-date'] ?? ''), scope);
  if (Math.abs(now - signingDate.getTime()) > allowedClockSkewMs) {
    throw new S3Refusal(
      403,
      'RequestTimeTooSkewed',
      'The difference between the request time and the current time is too large.',
    );
  }
  const signedHeaders = signedHeaderList.split(';');
  const payloadHash = String(req.headers['x-amz-content-sha256'] ?? '');
  if (!payloadHash)
    throw new S3Refusal(400, 'InvalidRequest', 'Missing required header for this request: x-amz-content-sha256.');
  const signed = await signer.sign(toSignerRequest(req, path, query, signedHeaders), {
    signingDate,
    signableHeaders: new Set(signedHeaders),
    signingRegion: scope.region,
    signingService: scope.service,
  });
  const computed = /Signature=([0-9a-f]{64})$/.exec(String(signed.headers.authorization))?.[1] ?? '';
  if (!sameHex(computed, provided)) throw mismatch('Check your key and signing method.');
  return { mode: 'header', signature: provided, signedHeaders, payloadHash } satisfies VerifiedRequest;
}

async function verifyPresigned(
  req: IncomingMessage,
  path: string,
  query: Query,
  signer: SignatureV4,
  creds: Credentials,
  now: number,
) {
  if (query['X-Amz-Algorithm'] !== 'AWS4-HMAC-SHA256')
    throw new S3Refusal(400, 'AuthorizationQueryParametersError', 'X-Amz-Algorithm must be AWS4-HMAC-SHA256.');
  const scope = checkScope(String(query['X-Amz-Credential'] ?? ''), creds);
  const signingDate = parseAmzDate(String(query['X-Amz-Date'] ?? ''), scope);
  const expiresIn = Number(query['X-Amz-Expires']);
  if (!Number.isInteger(expiresIn) || expiresIn < 1 || expiresIn > maxPresignSeconds) {
    throw new S3Refusal(
      400,
      'AuthorizationQueryParametersError',
      'X-Amz-Expires must be a whole number of seconds from 1 to 604800.',
    );
  }
  const expiresAt = signingDate.getTime() + expiresIn * 1000;
  if (now > expiresAt) throw new S3Refusal(403, 'AccessDenied', 'Request has expired');
  if (signingDate.getTime() - now > allowedClockSkewMs)
    throw new S3Refusal(403, 'AccessDenied', 'Request is not valid yet');
  const provided = String(query['X-Amz-Signature']);
  const signedHeaders = String(query['X-Amz-SignedHeaders'] ?? '').split(';');
  const rest: Query = Object.fromEntries(Object.entries(query).filter(([key]) => !presignParams.includes(key)));
  const request = toSignerRequest(req, path, rest, signedHeaders);
  // The presigner signs an UNSIGNED-PAYLOAD header and then hoists it into the query; the signer reads the payload
  // hash from that header, so give it back as a header it will neither hoist nor sign.
  const payloadHash = String(query['X-Amz-Content-Sha256'] ?? 'UNSIGNED-PAYLOAD');
  request.headers['x-amz-content-sha256'] = payloadHash;
  const signedAmz = signedHeaders.filter((name) => name.startsWith('x-amz-'));
  const presigned = await signer.presign(request, {
    signingDate,
    expiresIn,
    signingRegion: scope.region,
    signingService: scope.service,
    signableHeaders: new Set(signedHeaders),
    unsignableHeaders: new Set(signedHeaders.includes('x-amz-content-sha256') ? [] : ['x-amz-content-sha256']),
    unhoistableHeaders: new Set([...signedAmz, 'x-amz-content-sha256']),
  });
  if (!sameHex(String(presigned.query?.['X-Amz-Signature'] ?? ''), provided))
    throw mismatch('The URL may have been altered.');
  return { mode: 'presigned', signature: provided, signedHeaders, payloadHash, expiresAt } satisfies VerifiedRequest;
}

function toSignerRequest(req: IncomingMessage, path: string, query: Query, signedHeaders: string[]): SignerRequest {
  const headers: Record<string, string> = {};
  for (const name of signedHeaders) {
    const value = req.headers[name];
    if (value === undefined) throw mismatch(`The signed header "${name}" is missing from the request.`);
    headers[name] = Array.isArray(value) ? value.join(',') : value;
  }
  // Canonical host is whatever the client put in Host (127.0.0.1 vs localhost, with its port), never our own idea.
  const [hostname, port] = String(req.headers.host ?? '').split(/:(?=\d+$)/);
  return {
    method: req.method ?? 'GET',
    protocol: 'http:',
    hostname,
    port: port ? Number(port) : undefined,
    path,
    query,
    headers,
  };
}

function checkScope(credential: string, creds: Credentials): Scope {
  const [accessKeyId, date, region, service, terminator] = credential.split('/');
  if (accessKeyId !== creds.accessKeyId) {
    throw new S3Refusal(403, 'InvalidAccessKeyId', 'The AWS Access Key Id you provided does not exist in our records.');
  }
  if (!/^\d{8}$/.test(date ?? '') || region !== creds.region || service !== 's3' || terminator !== 'aws4_request') {
    throw mismatch(`The credential scope must be <date>/${creds.region}/s3/aws4_request.`);
  }
  return { accessKeyId, date, region, service };
}

function parseAmzDate(value: string, scope: Scope): Date {
  const m = /^(\d{4})(\d{2})(\d{2})T(\d{2})(\d{2})(\d{2})Z$/.exec(value);
  if (!m || `${m[1]}${m[2]}${m[3]}` !== scope.date) {
    throw new S3Refusal(403, 'AccessDenied', 'The request date is missing or does not match the credential scope.');
  }
  return new Date(Date.UTC(+m[1], +m[2] - 1, +m[3], +m[4], +m[5], +m[6]));
}

function parseQuery(raw: string): Query {
  const query: Query = {};
  for (const [key, value] of new URLSearchParams(raw)) {
    const existing = query[key];
    query[key] = existing === undefined ? value : [...(Array.isArray(existing) ? existing : [existing]), value];
  }
  return query;
}

function sameHex(a: string, b: string): boolean {
  return a.length === b.length && timingSafeEqual(Buffer.from(a), Buffer.from(b));
}
