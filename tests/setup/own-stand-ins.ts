import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { startStandIns, type StandIns } from '../../fakes';

export interface OwnStandIns {
  standIns: StandIns;
  /** The settings that point a test app's e-mail at this mail catcher. */
  smtpEnv: { SMTP_HOST: string; SMTP_PORT: string };
  stop(): Promise<void>;
}

/**
 * Stand-ins of a test file's own, in their own folder: a file that slows or stops the mail catcher does it to these,
 * never to the shared ones other files use. Only the mail catcher is used; storage and sign-in sit idle.
 */
export async function startOwnStandIns(name: string): Promise<OwnStandIns> {
  const dir = await mkdtemp(join(tmpdir(), `gradepass-${name}-`));
  const standIns = await startStandIns({
    dataDir: dir,
    bucket: name,
    allowedOrigins: [],
    oauth: {
      clientId: 'unused',
      clientSecret: 'unused-secret',
      redirectUris: ['http://127.0.0.1/unused'],
      identities: [],
    },
  });
  return {
    standIns,
    smtpEnv: { SMTP_HOST: standIns.mail.smtpHost, SMTP_PORT: String(standIns.mail.smtpPort) },
    stop: async () => {
      await standIns.stop();
      await rm(dir, { recursive: true, force: true });
    },
  };
}
