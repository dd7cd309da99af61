import { spawn, type ChildProcess } from 'node:child_process';
import { mkdirSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { localPaymentKeys, startStandIns } from '../../fakes';
import { paymentWebhookPath } from '@shared/contracts/payments';
import { applyMigrations, createDb } from '../db/client';
import { demoPeople } from './seed/demo-people';
import { seedDemo } from './seed';
import { seedDemoQuotePdfs } from './seed/demo-quotes';
import { seedDemoCrewPhotos } from './seed/demo-inspection';
import { seedDemoPackets } from './seed/demo-packets';
import { seedDemoReports } from './seed/demo-reports';
import { seedDemoPayments } from './seed/demo-payments';
import { closeContext, createContext } from '../context-factory';
import { parseEnv } from '../config/env';
import { devBucket, devOAuthClient, devPorts } from './dev-config';
import { ensureDatabase, startPostgres } from './postgres';
import { standInEnv } from './stand-in-env';

const root = fileURLToPath(new URL('../..', import.meta.url));
const dataDir = `${root}.data/dev`;

// The pinned SDK runs on Node 20; its notice about future releases is for whoever upgrades it (DEVELOPERS.md). Set
// here, it covers the demo reports stored from this process and the app it starts.
process.env.AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED ??= 'true';

async function main() {
  mkdirSync(dataDir, { recursive: true });
  const stops: (() => Promise<void> | void)[] = [];
  let server: ChildProcess | undefined;
  let stopping = false;
  const stopAll = async (code: number) => {
    if (stopping) return;
    stopping = true;
    console.log('\nStopping Gradepass...');
    if (server?.pid && server.exitCode === null) {
      const exited = new Promise((resolve) => server!.once('exit', resolve));
      server.kill('SIGTERM');
      await exited;
    }
    for (const stop of stops.reverse()) {
      try {
        await stop();
      } catch (error) {
        console.error(error instanceof Error ? error.message : error);
      }
    }
    process.exit(code);
  };
  process.on('SIGINT', () => void stopAll(0));
  process.on('SIGTERM', () => void stopAll(0));

  try {
    const pg = await startPostgres(`${dataDir}/postgres`, devPorts.postgres);
    stops.push(() => pg.stop());
    await ensureDatabase(pg.url('postgres'), 'gradepass');
    const databaseUrl = pg.url('gradepass');
    await applyMigrations(databaseUrl);
    const { db, pool } = createDb(databaseUrl, { max: 2 });
    await seedDemo(db);
    await pool.end();

    const appOrigin = `http://127.0.0.1:${devPorts.app}`;
    const standIns = await startStandIns({
      dataDir: `${dataDir}/fakes`,
      s3Port: devPorts.s3,
      smtpPort: devPorts.smtp,
      mailWebPort: devPorts.mailWeb,
      oauthPort: devPorts.oauth,
      paymentsPort: devPorts.payments,
      bucket: devBucket,
      allowedOrigins: [appOrigin, `http://localhost:${devPorts.app}`],
      oauth: { ...devOAuthClient, redirectUris: [`${appOrigin}/auth/google/callback`], identities: demoPeople },
      payments: { ...localPaymentKeys, webhookUrl: `${appOrigin}${paymentWebhookPath}` },
    });
    stops.push(() => standIns.stop());

    const env = {
      ...process.env,
      ...standInEnv(standIns, { appOrigin, port: devPorts.app, databaseUrl }),
      NODE_ENV: 'development',
    };
    // The demo's reports go into storage, so they can only be made now that it runs.
    const seedCtx = createContext(parseEnv({ ...env, LOG_LEVEL: 'warn' }));
    try {
      await seedDemoReports(seedCtx);
      await seedDemoQuotePdfs(seedCtx);
      // Card payments go through the payments stand-in, so they too wait until it runs.
      await seedDemoPayments(seedCtx);
      await seedDemoCrewPhotos(seedCtx);
      await seedDemoPackets(seedCtx);
    } finally {
      await closeContext(seedCtx);
    }
    server = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], { cwd: root, env, stdio: 'inherit' });
    server.once('exit', (code) => {
      if (!stopping) void stopAll(code ?? 1);
    });

    console.log(
      [
        '',
        'Gradepass is running. Press Ctrl-C to stop everything.',
        `  App:             ${appOrigin}`,
        `  Sign-in picker:  ${standIns.oauth.authorizationUrl} (opens from the app's Sign in button)`,
        `  Mail catcher:    ${standIns.mail.webUrl}`,
        `  File storage:    ${standIns.s3.endpoint} (bucket ${standIns.s3.bucket})`,
        `  Payments:        ${standIns.payments.url} (payment pages and the notices sent to the app)`,
        `  PostgreSQL:      ${databaseUrl}`,
        `  Data folder:     ${dataDir}`,
        '',
      ].join('\n'),
    );
  } catch (error) {
    console.error(error instanceof Error ? error.message : error);
    await stopAll(1);
  }
}

void main();
