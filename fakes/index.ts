import { join } from 'node:path';
import { defaultHost } from './lib/listen.js';
import { startMailStandIn } from './mail/start-mail.js';
import { startOAuthStandIn } from './oauth/start-oauth.js';
import { startPaymentsStandIn } from './payments/start-payments.js';
import { startS3StandIn } from './s3/start-s3.js';
import type { PaymentsStandIn } from './payments/start-payments.js';

export { startMailStandIn, type MailStandIn, type MailStandInOptions } from './mail/start-mail.js';
export type { StoredMessage } from './mail/message-store.js';
export { startOAuthStandIn, type OAuthStandIn, type OAuthStandInOptions } from './oauth/start-oauth.js';
export { subjectFor, type DemoIdentity, type OpenIdProfile } from './oauth/identities.js';
export {
  startPaymentsStandIn,
  signatureHeader,
  testCards,
  type PaymentsStandIn,
  type PaymentsStandInOptions,
} from './payments/start-payments.js';
export { startS3StandIn, type S3StandIn, type S3StandInOptions } from './s3/start-s3.js';

export interface StandInOptions {
  /** A git-ignored folder; each service keeps its data in a subfolder (s3/, mail/). */
  dataDir: string;
  host?: string;
  /** 0 or omitted means a random free port. */
  s3Port?: number;
  smtpPort?: number;
  mailWebPort?: number;
  oauthPort?: number;
  paymentsPort?: number;
  bucket: string;
  /** Page origins allowed to upload straight to storage; 127.0.0.1 and localhost are different origins. */
  allowedOrigins: string[];
  oauth: {
    clientId: string;
    clientSecret: string;
    redirectUris: string[];
    identities: { email: string; name: string; role?: string }[];
  };
  /** The payment provider's keys and the app's webhook endpoint; local test keys when left out. */
  payments?: { secretKey: string; webhookSecret: string; webhookUrl?: string };
}

/** The payments stand-in's keys when the caller names none; they only ever open this local stand-in. */
export const localPaymentKeys = { secretKey: 'sk_test_gradepass_local', webhookSecret: 'whsec_gradepass_local' };

export interface StandIns {
  s3: { endpoint: string; accessKeyId: string; secretAccessKey: string; region: string; bucket: string };
  mail: {
    smtpHost: string;
    smtpPort: number;
    webUrl: string;
    stopSmtp(): Promise<void>;
    startSmtp(): Promise<void>;
    setReplyDelay(ms: number): void;
  };
  oauth: { issuer: string; authorizationUrl: string; tokenUrl: string; userinfoUrl: string };
  payments: Omit<PaymentsStandIn, 'stop'>;
  stop(): Promise<void>;
}

/** Starts storage, mail, sign-in and payments together; if one fails to start, the ones already up are stopped again. */
export async function startStandIns(opts: StandInOptions): Promise<StandIns> {
  const host = opts.host ?? defaultHost;
  const started: { stop(): Promise<void> }[] = [];
  const stopAll = async () => {
    const results = await Promise.allSettled(
      started
        .splice(0)
        .reverse()
        .map((service) => service.stop()),
    );
    const failed = results.find((result): result is PromiseRejectedResult => result.status === 'rejected');
    if (failed) throw failed.reason;
  };
  try {
    const s3 = await startS3StandIn({
      dir: join(opts.dataDir, 's3'),
      host,
      port: opts.s3Port,
      bucket: opts.bucket,
      allowedOrigins: opts.allowedOrigins,
    });
    started.push(s3);
    const mail = await startMailStandIn({
      dir: join(opts.dataDir, 'mail'),
      host,
      smtpPort: opts.smtpPort,
      webPort: opts.mailWebPort,
    });
    started.push(mail);
    const oauth = await startOAuthStandIn({ host, port: opts.oauthPort, ...opts.oauth });
    started.push(oauth);
    const payments = await startPaymentsStandIn({
      dir: join(opts.dataDir, 'payments'),
      host,
      port: opts.paymentsPort,
      ...(opts.payments ?? localPaymentKeys),
    });
    started.push(payments);
    return {
      s3: withoutStop(s3),
      mail: withoutStop(mail),
      oauth: withoutStop(oauth),
      payments: withoutStop(payments),
      stop: stopAll,
    };
  } catch (error) {
    await stopAll().catch(() => undefined);
    throw error;
  }
}

/** Each service is stopped only through StandIns.stop(), so the per-service stop is left out of the result. */
function withoutStop<T extends { stop(): Promise<void> }>(service: T): Omit<T, 'stop'> {
  const copy: Partial<T> = { ...service };
  delete copy.stop;
  return copy as Omit<T, 'stop'>;
}
