import { mkdtemp, readdir, rm } from 'node:fs/promises';
import { createConnection } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { ListObjectsV2Command, S3Client } from '@aws-sdk/client-s3';
import { afterAll, beforeAll, expect, it } from 'vitest';
import { startStandIns, type StandIns } from '../../fakes/index.js';

let dataDir: string;
let standIns: StandIns;

beforeAll(async () => {
  dataDir = await mkdtemp(join(tmpdir(), 'gradepass-stand-ins-'));
  standIns = await startStandIns({
    dataDir,
    bucket: 'gradepass-photos',
    allowedOrigins: ['http://127.0.0.1:5170'],
    oauth: {
      clientId: 'c',
      clientSecret: 's',
      redirectUris: ['http://127.0.0.1:5170/cb'],
      identities: [{ email: 'a@gradepass.test', name: 'A Person' }],
    },
  });
});

afterAll(async () => {
  await standIns?.stop();
  await rm(dataDir, { recursive: true, force: true });
});

const portOf = (url: string) => Number(new URL(url).port);
const accepts = (port: number) =>
  new Promise<boolean>((resolve) => {
    const socket = createConnection({ host: '127.0.0.1', port }, () => {
      socket.destroy();
      resolve(true);
    });
    socket.on('error', () => resolve(false));
  });

it('starts every service on loopback with the bucket ready and data under dataDir', async () => {
  for (const url of [standIns.s3.endpoint, standIns.mail.webUrl, standIns.oauth.issuer])
    expect(new URL(url).hostname).toBe('127.0.0.1');
  expect(standIns.mail.smtpHost).toBe('127.0.0.1');
  const client = new S3Client({
    endpoint: standIns.s3.endpoint,
    region: standIns.s3.region,
    forcePathStyle: true,
    credentials: standIns.s3,
    requestChecksumCalculation: 'WHEN_REQUIRED',
  });
  await expect(client.send(new ListObjectsV2Command({ Bucket: standIns.s3.bucket }))).resolves.toMatchObject({
    $metadata: { httpStatusCode: 200 },
  });
  client.destroy();
  expect((await readdir(dataDir)).sort()).toEqual(['mail', 'payments', 's3']);
});

it('stops everything and frees every port', async () => {
  const second = await startStandIns({
    dataDir: join(dataDir, 'second'),
    bucket: 'b',
    allowedOrigins: [],
    oauth: { clientId: 'c', clientSecret: 's', redirectUris: [], identities: [] },
  });
  const ports = [
    portOf(second.s3.endpoint),
    second.mail.smtpPort,
    portOf(second.mail.webUrl),
    portOf(second.oauth.issuer),
  ];
  for (const port of ports) expect(await accepts(port)).toBe(true);
  await second.stop();
  for (const port of ports) expect(await accepts(port)).toBe(false);
});
