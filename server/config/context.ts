import type { S3Client } from '@aws-sdk/client-s3';
import type { Transporter } from 'nodemailer';
import type pg from 'pg';
import type Stripe from 'stripe';
import type { Db } from '../db/client';
import type { ChangeNotices } from '../infra/change-notices';
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
  /** When anything shown in the office queue may have changed (`server/infra/change-notices.ts`). */
  queueChanges: ChangeNotices;
}
