import { Agent } from 'node:http';
import { mkdir } from 'node:fs/promises';
import { join } from 'node:path';
import S3rver from 's3rver';
import { close, defaultHost, listen, urlFor } from '../lib/listen.js';
import { UsedUploadSignatures } from './used-upload-signatures.js';
import { createVerifyingProxy } from './verifying-proxy.js';

export interface S3StandInOptions {
  /** This service's own folder (objects and spent upload signatures live inside). */
  dir: string;
  host?: string;
  port?: number;
  bucket: string;
  allowedOrigins: string[];
}

export interface S3StandIn {
  endpoint: string;
  accessKeyId: string;
  secretAccessKey: string;
  region: string;
  bucket: string;
  stop(): Promise<void>;
}

// s3rver's built-in account; it does not check V4 signatures itself, which is why the proxy in front exists.
const credentials = { accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER', region: 'us-east-1' };

/** s3rver on a private loopback port, and the signature-checking endpoint that callers actually use. */
export async function startS3StandIn(options: S3StandInOptions): Promise<S3StandIn> {
  const host = options.host ?? defaultHost;
  await mkdir(join(options.dir, 'objects'), { recursive: true });
  const backend = new S3rver({
    address: '127.0.0.1',
    port: 0,
    silent: true,
    directory: join(options.dir, 'objects'),
    vhostBuckets: false,
    configureBuckets: [{ name: options.bucket }],
  });
  const { port: upstreamPort } = await backend.run();
  const agent = new Agent({ keepAlive: true });
  try {
    const usedSignatures = await UsedUploadSignatures.open(join(options.dir, 'spent-upload-signatures.txt'));
    const proxy = createVerifyingProxy({
      credentials,
      allowedOrigins: options.allowedOrigins,
      upstreamPort,
      usedSignatures,
      agent,
    });
    const port = await listen(proxy, options.port ?? 0, host);
    return {
      endpoint: urlFor(host, port),
      ...credentials,
      bucket: options.bucket,
      async stop() {
        await close(proxy);
        agent.destroy();
        await close(backend.httpServer);
      },
    };
  } catch (error) {
    agent.destroy();
    await close(backend.httpServer);
    throw error;
  }
}
