import { z } from 'zod';
import type { DbTimeouts } from '../db/client';
import { securityEnvShape } from './security-env';

const port = z.coerce.number().int().min(0).max(65535);

const millis = z.coerce.number().int().min(1);
const seconds = z.coerce.number().positive();

/** A database that stops answering must fail requests fast (503) instead of holding them. See README. */
const databaseTimeouts = {
  /** Opening a connection, and waiting for a free one in the pool. */
  DB_CONNECT_TIMEOUT_MS: millis.default(2_000),
  /** PostgreSQL cancels a statement after this; the client gives up on an unanswered one half a second later. */
  DB_STATEMENT_TIMEOUT_MS: millis.default(3_000),
  DB_IDLE_IN_TRANSACTION_TIMEOUT_MS: millis.default(10_000),
};

/** The e-mail outbox's clock: how long a sender's claim lasts unrenewed, and how long failed mail is retried. */
const emailDelivery = {
  EMAIL_LEASE_SECONDS: seconds.default(15),
  EMAIL_RETRY_FIRST_DELAY_SECONDS: seconds.default(5),
  EMAIL_RETRY_MAX_DELAY_SECONDS: seconds.default(600),
  EMAIL_RETRY_HORIZON_SECONDS: seconds.default(2 * 24 * 3600),
};

const envSchema = z.object({
  NODE_ENV: z.enum(['development', 'test', 'production']).default('development'),
  HOST: z.string().default('127.0.0.1'),
  PORT: port.default(5170),
  /** The origin people reach the app at; links in e-mails and the OAuth callback are built from it. */
  APP_ORIGIN: z.url().default('http://127.0.0.1:5170'),
  DATABASE_URL: z.string().min(1),
  SESSION_SECRET: z.string().min(16, 'SESSION_SECRET must be at least 16 characters'),
  ...securityEnvShape,
  GOOGLE_CLIENT_ID: z.string().min(1),
  GOOGLE_CLIENT_SECRET: z.string().min(1),
  /** Leave the three URLs unset to use Google itself; set them to use another OAuth 2.0 provider. */
  GOOGLE_AUTHORIZATION_URL: z.url().optional(),
  GOOGLE_TOKEN_URL: z.url().optional(),
  GOOGLE_USERINFO_URL: z.url().optional(),
  S3_ENDPOINT: z.url().optional(),
  S3_REGION: z.string().default('us-east-1'),
  S3_BUCKET: z.string().min(1),
  S3_ACCESS_KEY_ID: z.string().min(1),
  S3_SECRET_ACCESS_KEY: z.string().min(1),
  S3_FORCE_PATH_STYLE: z
    .enum(['true', 'false'])
    .default('false')
    .transform((v) => v === 'true'),
  SMTP_HOST: z.string().min(1),
  SMTP_PORT: port,
  SMTP_SECURE: z
    .enum(['true', 'false'])
    .default('false')
    .transform((v) => v === 'true'),
  SMTP_USER: z.string().optional(),
  SMTP_PASSWORD: z.string().optional(),
  /** The payment provider: its secret API key and the webhook endpoint's signing secret (see README, Payments). */
  STRIPE_SECRET_KEY: z.string().min(1),
  STRIPE_WEBHOOK_SECRET: z.string().min(1),
  /** Leave these three unset to reach the provider itself; set them to reach another server speaking its API. */
  STRIPE_API_HOST: z.string().min(1).optional(),
  STRIPE_API_PORT: port.optional(),
  STRIPE_API_PROTOCOL: z.enum(['http', 'https']).optional(),
  /** The currency every quote and payment is in (ISO 4217, lower case); amounts are kept in its smallest unit. */
  PAYMENT_CURRENCY: z
    .string()
    .regex(/^[a-z]{3}$/, 'PAYMENT_CURRENCY must be a three-letter currency code in lower case, such as usd')
    .default('usd'),
  MAIL_FROM: z.string().default('Gradepass <no-reply@gradepass.test>'),
  MAIL_REPLY_TO: z.string().optional(),
  OFFICE_EMAIL: z.email().default('office@gradepass.test'),
  /** The contractor's name, as its reports and sign-in messages say it. */
  COMPANY_NAME: z.string().trim().min(1).max(120).default('Tamarack Ridge Excavating'),
  /** The office's time zone (IANA name): visit times in e-mails and invitations are said in it. */
  OFFICE_TIME_ZONE: z
    .string()
    .default('America/New_York')
    .refine((zone) => {
      try {
        new Intl.DateTimeFormat('en-US', { timeZone: zone });
        return true;
      } catch {
        return false;
      }
    }, 'OFFICE_TIME_ZONE must be a time zone name such as America/New_York'),
  /** Background work (e-mail delivery) runs in every instance unless turned off. */
  RUN_WORKERS: z
    .enum(['true', 'false'])
    .default('true')
    .transform((v) => v === 'true'),
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
  ...databaseTimeouts,
  ...emailDelivery,
});

export type Env = z.infer<typeof envSchema>;

export function parseEnv(source: NodeJS.ProcessEnv = process.env): Env {
  const result = envSchema.safeParse(source);
  if (!result.success) {
    const lines = result.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`);
    throw new Error(`Gradepass cannot start: the environment is not valid.\n${lines.join('\n')}`);
  }
  return result.data;
}

export function dbTimeouts(env: Env): DbTimeouts {
  return {
    connectMs: env.DB_CONNECT_TIMEOUT_MS,
    statementMs: env.DB_STATEMENT_TIMEOUT_MS,
    idleInTransactionMs: env.DB_IDLE_IN_TRANSACTION_TIMEOUT_MS,
  };
}
