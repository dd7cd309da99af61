import { chmodSync, mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import type { TestProject } from 'vitest/node';
import { localPaymentKeys, startStandIns } from '../../fakes';
import { paymentWebhookPath } from '../../shared/contracts/payments';
import { applyMigrations } from '../../server/db/client';
import { demoPeople } from '../../server/dev/seed/demo-people';
import { devOAuthClient } from '../../server/dev/dev-config';
import { ensureDatabase, startPostgres } from '../../server/dev/postgres';
import { standInEnv } from '../../server/dev/stand-in-env';
import { ensureBrowserTools } from './browser-tools';
import { freePort } from './free-port';
import { startE2eApp } from './e2e-app';
import type { TestStack } from './stack';

const root = fileURLToPath(new URL('../..', import.meta.url));

/**
 * Starts a throwaway PostgreSQL and the stand-ins on free ports under a temporary folder, so a test run never
 * touches `npm start`'s data and two runs can go at once. Migrations are applied once, into a template database
 * that every test file copies.
 */
export default async function setup(project: TestProject) {
  const browser = project.name === 'browser';
  if (browser) ensureBrowserTools();
  const dir = mkdtempSync(path.join(os.tmpdir(), 'gradepass-test-'));
  chmodSync(dir, 0o755);
  const artifactsDir = path.join(root, 'test-artifacts');
  mkdirSync(artifactsDir, { recursive: true });

  const pg = await startPostgres(path.join(dir, 'postgres'), await freePort(), { throwaway: true });
  const adminDatabaseUrl = pg.url('postgres');
  const templateDatabase = 'gradepass_template';
  await ensureDatabase(adminDatabaseUrl, templateDatabase);
  await applyMigrations(pg.url(templateDatabase));

  const appPort = await freePort();
  const appOrigin = `http://127.0.0.1:${appPort}`;
  const standIns = await startStandIns({
    dataDir: path.join(dir, 'fakes'),
    bucket: 'gradepass-test',
    allowedOrigins: [appOrigin],
    oauth: { ...devOAuthClient, redirectUris: [`${appOrigin}/auth/google/callback`], identities: demoPeople },
    // Only the browser project's app listens; integration files that pay start a payments stand-in of their own.
    payments: { ...localPaymentKeys, webhookUrl: `${appOrigin}${paymentWebhookPath}` },
  });
  const env = standInEnv(standIns, { appOrigin, port: appPort, databaseUrl: '' });
  const stack: TestStack = { adminDatabaseUrl, templateDatabase, env, mailWebUrl: standIns.mail.webUrl, artifactsDir };

  const e2e = browser ? await startE2eApp(stack, pg.url('gradepass_e2e')) : undefined;
  if (e2e) stack.appUrl = appOrigin;
  project.provide('stack', stack);

  return async () => {
    await e2e?.stop();
    await standIns.stop();
    pg.stop();
    rmSync(dir, { recursive: true, force: true });
  };
}
