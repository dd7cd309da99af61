import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import {
  DeleteObjectCommand,
  GetObjectCommand,
  HeadObjectCommand,
  ListObjectsV2Command,
  PutObjectCommand,
  S3Client,
  S3ServiceException,
} from '@aws-sdk/client-s3';
import { getSignedUrl } from '@aws-sdk/s3-request-presigner';
import { Sha256 } from '@aws-crypto/sha256-js';
import { SignatureV4 } from '@smithy/signature-v4';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startS3StandIn, type S3StandIn } from '../../fakes/s3/start-s3.js';

const pageOrigin = 'http://127.0.0.1:5170';
let dir: string;
let s3: S3StandIn;
let client: S3Client;

function makeClient(secretAccessKey = s3.secretAccessKey) {
  return new S3Client({
    endpoint: s3.endpoint,
    region: s3.region,
    forcePathStyle: true,
    credentials: { accessKeyId: s3.accessKeyId, secretAccessKey },
    requestChecksumCalculation: 'WHEN_REQUIRED',
  });
}

const uniqueKey = (name: string) => `photos/${crypto.randomUUID()}/${name}`;

function presignPut(
  key: string,
  contentType: string,
  contentLength: number,
  extra: { expiresIn?: number; signingDate?: Date } = {},
) {
  const command = new PutObjectCommand({
    Bucket: s3.bucket,
    Key: key,
    ContentType: contentType,
    ContentLength: contentLength,
  });
  return getSignedUrl(client, command, { expiresIn: 300, signableHeaders: new Set(['content-type']), ...extra });
}

async function errorCode(response: Response) {
  return /<Code>([^<]+)<\/Code>/.exec(await response.text())?.[1];
}

beforeAll(async () => {
  dir = await mkdtemp(join(tmpdir(), 'gradepass-s3-'));
  s3 = await startS3StandIn({
    dir,
    port: 0,
    bucket: 'test-photos',
    allowedOrigins: [pageOrigin, 'http://localhost:5170'],
  });
  client = makeClient();
});

afterAll(async () => {
  client?.destroy();
  await s3?.stop();
  await rm(dir, { recursive: true, force: true });
});

describe('S3 stand-in: SDK calls signed in headers', () => {
  it('puts, heads, gets, lists and deletes an object', async () => {
    const key = uniqueKey('report one.pdf');
    await client.send(
      new PutObjectCommand({ Bucket: s3.bucket, Key: key, Body: 'grade check', ContentType: 'application/pdf' }),
    );
    const head = await client.send(new HeadObjectCommand({ Bucket: s3.bucket, Key: key }));
    expect(head.ContentLength).toBe(11);
    expect(head.ContentType).toBe('application/pdf');
    const got = await client.send(new GetObjectCommand({ Bucket: s3.bucket, Key: key }));
    expect(await got.Body?.transformToString()).toBe('grade check');
    const listed = await client.send(
      new ListObjectsV2Command({ Bucket: s3.bucket, Prefix: key.split('/').slice(0, 2).join('/') }),
    );
    expect(listed.Contents?.map((item) => item.Key)).toEqual([key]);
    await client.send(new DeleteObjectCommand({ Bucket: s3.bucket, Key: key }));
    await expect(client.send(new HeadObjectCommand({ Bucket: s3.bucket, Key: key }))).rejects.toMatchObject({
      $metadata: { httpStatusCode: 404 },
    });
  });

  it('refuses a client holding the wrong secret', async () => {
    const wrong = makeClient('not-the-secret');
    const attempt = wrong.send(new PutObjectCommand({ Bucket: s3.bucket, Key: uniqueKey('x.txt'), Body: 'x' }));
    await expect(attempt).rejects.toBeInstanceOf(S3ServiceException);
    await expect(attempt).rejects.toMatchObject({ name: 'SignatureDoesNotMatch', $metadata: { httpStatusCode: 403 } });
    wrong.destroy();
  });

  it('refuses a body that differs from the signed payload hash', async () => {
    const key = uniqueKey('swapped.txt');
    const url = new URL(`${s3.endpoint}/${s3.bucket}/${key}`);
    const signer = new SignatureV4({
      credentials: s3,
      region: s3.region,
      service: 's3',
      sha256: Sha256,
      uriEscapePath: false,
    });
    const signed = await signer.sign({
      method: 'PUT',
      protocol: 'http:',
      hostname: url.hostname,
      port: Number(url.port),
      path: url.pathname,
      query: {},
      headers: { host: url.host },
      body: 'original',
    });
    const response = await fetch(url, { method: 'PUT', headers: signed.headers, body: 'swapped!' });
    expect(response.status).toBe(400);
    expect(await errorCode(response)).toBe('XAmzContentSHA256Mismatch');
    await expect(client.send(new HeadObjectCommand({ Bucket: s3.bucket, Key: key }))).rejects.toMatchObject({
      $metadata: { httpStatusCode: 404 },
    });
  });

  it('refuses an unsigned request', async () => {
    const response = await fetch(`${s3.endpoint}/${s3.bucket}?list-type=2`);
    expect(response.status).toBe(403);
    expect(await errorCode(response)).toBe('AccessDenied');
  });
});

describe('S3 stand-in: presigned upload URLs', () => {
  it('accepts a PUT from plain fetch and stores the bytes', async () => {
    const key = uniqueKey('driveway.jpg');
    const body = new Uint8Array([0xff, 0xd8, 0xff, 0xe0, 1, 2, 3]);
    const response = await fetch(await presignPut(key, 'image/jpeg', body.length), {
      method: 'PUT',
      body,
      headers: { 'content-type': 'image/jpeg' },
    });
    expect(response.status).toBe(200);
    expect(response.headers.get('etag')).toBeTruthy();
    const head = await client.send(new HeadObjectCommand({ Bucket: s3.bucket, Key: key }));
    expect(head).toMatchObject({ ContentLength: body.length, ContentType: 'image/jpeg' });
  });

  it('refuses an expired URL', async () => {
    const url = await presignPut(uniqueKey('late.jpg'), 'image/jpeg', 3, {
      expiresIn: 60,
      signingDate: new Date(Date.now() - 120_000),
    });
    const response = await fetch(url, { method: 'PUT', body: 'abc', headers: { 'content-type': 'image/jpeg' } });
    expect(response.status).toBe(403);
    expect(await response.text()).toContain('Request has expired');
  });

  it('refuses an altered URL', async () => {
    const url = new URL(await presignPut(uniqueKey('mine.jpg'), 'image/jpeg', 3));
    url.pathname = url.pathname.replace('mine.jpg', 'theirs.jpg');
    const response = await fetch(url, { method: 'PUT', body: 'abc', headers: { 'content-type': 'image/jpeg' } });
    expect(response.status).toBe(403);
    expect(await errorCode(response)).toBe('SignatureDoesNotMatch');
  });

  it('refuses a second upload with the same URL', async () => {
    const url = await presignPut(uniqueKey('once.jpg'), 'image/jpeg', 3);
    const put = () => fetch(url, { method: 'PUT', body: 'abc', headers: { 'content-type': 'image/jpeg' } });
    expect((await put()).status).toBe(200);
    const replay = await put();
    expect(replay.status).toBe(403);
    expect(await replay.text()).toContain('already been used');
  });

  it('still refuses a used upload URL after a restart', async () => {
    const ownDir = await mkdtemp(join(tmpdir(), 'gradepass-s3-restart-'));
    const options = { dir: ownDir, bucket: 'restart-bucket', allowedOrigins: [] };
    let storage = await startS3StandIn(options);
    try {
      const own = new S3Client({
        endpoint: storage.endpoint,
        region: storage.region,
        forcePathStyle: true,
        credentials: storage,
        requestChecksumCalculation: 'WHEN_REQUIRED',
      });
      const command = new PutObjectCommand({
        Bucket: storage.bucket,
        Key: 'a.jpg',
        ContentType: 'image/jpeg',
        ContentLength: 3,
      });
      const url = new URL(
        await getSignedUrl(own, command, { expiresIn: 300, signableHeaders: new Set(['content-type']) }),
      );
      own.destroy();
      const put = (endpoint: string) =>
        fetch(`${endpoint}${url.pathname}${url.search}`, {
          method: 'PUT',
          body: 'abc',
          headers: { 'content-type': 'image/jpeg', host: url.host },
        });
      expect((await put(storage.endpoint)).status).toBe(200);
      await storage.stop();
      storage = await startS3StandIn({ ...options, port: Number(url.port) });
      const replay = await put(storage.endpoint);
      expect(replay.status).toBe(403);
      expect(await replay.text()).toContain('already been used');
    } finally {
      await storage.stop();
      await rm(ownDir, { recursive: true, force: true });
    }
  });

  it('refuses a content type other than the signed one', async () => {
    const key = uniqueKey('photo.jpg');
    const url = await presignPut(key, 'image/jpeg', 3);
    const response = await fetch(url, { method: 'PUT', body: 'abc', headers: { 'content-type': 'text/html' } });
    expect(response.status).toBe(403);
    await expect(client.send(new HeadObjectCommand({ Bucket: s3.bucket, Key: key }))).rejects.toMatchObject({
      $metadata: { httpStatusCode: 404 },
    });
  });

  it('refuses a body larger than the signed length', async () => {
    const url = await presignPut(uniqueKey('big.jpg'), 'image/jpeg', 4);
    const response = await fetch(url, {
      method: 'PUT',
      body: 'far more than four bytes',
      headers: { 'content-type': 'image/jpeg' },
    });
    expect(response.status).toBe(403);
  });

  it('refuses upload URLs that leave the content type unsigned', async () => {
    const command = new PutObjectCommand({
      Bucket: s3.bucket,
      Key: uniqueKey('loose.jpg'),
      ContentType: 'image/jpeg',
      ContentLength: 3,
    });
    const url = await getSignedUrl(client, command, { expiresIn: 300 });
    const response = await fetch(url, { method: 'PUT', body: 'abc', headers: { 'content-type': 'image/jpeg' } });
    expect(response.status).toBe(403);
    expect(await response.text()).toContain('must sign content-type');
  });
});

describe('S3 stand-in: presigned download URLs', () => {
  it('serves a presigned GET and refuses a tampered one', async () => {
    const key = uniqueKey('site.png');
    await client.send(
      new PutObjectCommand({ Bucket: s3.bucket, Key: key, Body: 'png bytes', ContentType: 'image/png' }),
    );
    const url = await getSignedUrl(client, new GetObjectCommand({ Bucket: s3.bucket, Key: key }), { expiresIn: 60 });
    const ok = await fetch(url);
    expect(ok.status).toBe(200);
    expect(await ok.text()).toBe('png bytes');
    const tampered = new URL(url);
    tampered.searchParams.set('X-Amz-Expires', '604800');
    const refused = await fetch(tampered);
    expect(refused.status).toBe(403);
    expect(await errorCode(refused)).toBe('SignatureDoesNotMatch');
  });
});

describe('S3 stand-in: CORS for the app page', () => {
  const preflight = (origin: string) =>
    fetch(`${s3.endpoint}/${s3.bucket}/photos/a.jpg`, {
      method: 'OPTIONS',
      headers: { origin, 'access-control-request-method': 'PUT', 'access-control-request-headers': 'content-type' },
    });

  it('answers a preflight from an allowed origin', async () => {
    for (const origin of [pageOrigin, 'http://localhost:5170']) {
      const response = await preflight(origin);
      expect(response.status).toBe(200);
      expect(response.headers.get('access-control-allow-origin')).toBe(origin);
      expect(response.headers.get('access-control-allow-methods')).toContain('PUT');
      expect(response.headers.get('access-control-allow-headers')).toBe('content-type');
    }
  });

  it('refuses a preflight from another origin', async () => {
    const response = await preflight('http://elsewhere.test');
    expect(response.status).toBe(403);
    expect(response.headers.get('access-control-allow-origin')).toBeNull();
  });

  it('lets the page read the ETag of its upload', async () => {
    const url = await presignPut(uniqueKey('from-page.jpg'), 'image/jpeg', 3);
    const response = await fetch(url, {
      method: 'PUT',
      body: 'abc',
      headers: { 'content-type': 'image/jpeg', origin: pageOrigin },
    });
    expect(response.status).toBe(200);
    expect(response.headers.get('access-control-allow-origin')).toBe(pageOrigin);
    expect(response.headers.get('access-control-expose-headers')).toBe('ETag');
  });
});
