import { createHash } from 'node:crypto';
import type { Request } from 'express';
import { z } from 'zod';
import { AppError } from './errors';

/** The header a client names a write with, so that sending it again (after a lost answer) stores it once. */
export const idempotencyHeader = 'Idempotency-Key';

const keySchema = z.uuid();

export interface IdempotencyKey {
  key: string;
  /** A digest of what was sent with the key: the same key with something else is refused. */
  digest: string;
}

/** JSON with its object keys sorted, so two equal bodies give one text whatever order their fields came in. */
function canonical(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(canonical).join(',')}]`;
  if (value && typeof value === 'object') {
    const entries = Object.entries(value as Record<string, unknown>)
      .filter(([, v]) => v !== undefined)
      .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
    return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${canonical(v)}`).join(',')}}`;
  }
  return JSON.stringify(value) ?? 'null';
}

export const bodyDigest = (value: unknown) => createHash('sha256').update(canonical(value)).digest('hex');

/**
 * The request's Idempotency-Key, if it sent one, with the digest of the parsed body it came with. A key that is
 * not a UUID is a 400 naming the header, so a client never believes a key it mistyped protects it.
 */
export function readIdempotencyKey(req: Request, body: unknown): IdempotencyKey | undefined {
  const raw = req.get(idempotencyHeader);
  if (raw === undefined) return undefined;
  const parsed = keySchema.safeParse(raw.trim());
  if (!parsed.success) {
    throw new AppError(400, 'invalid_input', `The ${idempotencyHeader} header must be a UUID.`, {
      [idempotencyHeader]: 'must be a UUID, e.g. 3f0c5a8e-2b7d-4c1e-9a6f-0d4b8e2c7a15',
    });
  }
  return { key: parsed.data.toLowerCase(), digest: bodyDigest(body) };
}
