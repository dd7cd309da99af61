import type { S3Client } from '@aws-sdk/client-s3';
import type { Transporter } from 'nodemailer';
import type pg from 'pg';
import type Stripe from 'stripe';
import type { Db } from '../db/client';
import type { Env } from './env';
import type { Logger } from '../lib/logger';

/** Everything a route or service needs from the outside world, built once at start-up and passed down. */
export interface AppContext {
  env: Env;
  db: Db;
  pool: pg.Pool;
  logger: Logger;
  s3: S3Client;
  mailer: Transporter;
  /** The payment provider's SDK client (`server/infra/payments.ts`). */
  payments: Stripe;
  /** When anything shown in the office queue may have changed (`ChangeNotices`, `server/infra/change-notices.ts`). */
  queueChanges: ChangeStamps;
}

/**
 * A number that moves whenever something may have changed, for caches kept in a process: a cached value is good
 * while the stamp read before building it is still the stamp now. Null while changes cannot be heard.
 */
export interface ChangeStamps {
  stamp(): number | null;
  /** Something changed here; whatever was built before now is out of date. */
  changed(): void;
  /** Whether changes are being heard now. */
  readonly listening: boolean;
  close(): Promise<void>;
}
