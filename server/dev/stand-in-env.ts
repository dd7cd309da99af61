import type { StandIns } from '../../fakes';
import { devOAuthClient } from './dev-config';

/**
 * The environment that points the app at the local stand-ins. Production sets the same variables to real services;
 * nothing in the app knows which it is talking to.
 */
export function standInEnv(standIns: StandIns, opts: { appOrigin: string; port: number; databaseUrl: string }) {
  return {
    HOST: '127.0.0.1',
    PORT: String(opts.port),
    APP_ORIGIN: opts.appOrigin,
    DATABASE_URL: opts.databaseUrl,
    SESSION_SECRET: 'local-stand-in-session-secret-not-for-production',
    GOOGLE_CLIENT_ID: devOAuthClient.clientId,
    GOOGLE_CLIENT_SECRET: devOAuthClient.clientSecret,
    GOOGLE_AUTHORIZATION_URL: standIns.oauth.authorizationUrl,
    GOOGLE_TOKEN_URL: standIns.oauth.tokenUrl,
    GOOGLE_USERINFO_URL: standIns.oauth.userinfoUrl,
    S3_ENDPOINT: standIns.s3.endpoint,
    S3_REGION: standIns.s3.region,
    S3_BUCKET: standIns.s3.bucket,
    S3_ACCESS_KEY_ID: standIns.s3.accessKeyId,
    S3_SECRET_ACCESS_KEY: standIns.s3.secretAccessKey,
    S3_FORCE_PATH_STYLE: 'true',
    SMTP_HOST: standIns.mail.smtpHost,
    SMTP_PORT: String(standIns.mail.smtpPort),
    STRIPE_SECRET_KEY: standIns.payments.secretKey,
    STRIPE_WEBHOOK_SECRET: standIns.payments.webhookSecret,
    STRIPE_API_HOST: standIns.payments.host,
    STRIPE_API_PORT: String(standIns.payments.port),
    STRIPE_API_PROTOCOL: standIns.payments.protocol,
    MAIL_FROM: 'Gradepass <no-reply@gradepass.test>',
    MAIL_REPLY_TO: 'office@gradepass.test',
    OFFICE_EMAIL: 'office@gradepass.test',
  } satisfies Record<string, string>;
}
