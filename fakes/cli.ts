import { parseArgs } from 'node:util';
import { startStandIns } from './index.js';

// For running the stand-ins by hand; `npm start` and the tests start them from code instead.
const usage = `Usage: npx tsx fakes/cli.ts --data DIR [--host 127.0.0.1] [--s3-port N] [--smtp-port N] [--mail-web-port N]
       [--oauth-port N] [--bucket NAME] [--origin URL]... [--client-id ID] [--client-secret S] [--redirect-uri URL]...`;

const { values } = parseArgs({
  options: {
    data: { type: 'string' },
    host: { type: 'string', default: '127.0.0.1' },
    's3-port': { type: 'string', default: '0' },
    'smtp-port': { type: 'string', default: '0' },
    'mail-web-port': { type: 'string', default: '0' },
    'oauth-port': { type: 'string', default: '0' },
    bucket: { type: 'string', default: 'gradepass-photos' },
    origin: { type: 'string', multiple: true, default: ['http://127.0.0.1:5170', 'http://localhost:5170'] },
    'client-id': { type: 'string', default: 'gradepass-local' },
    'client-secret': { type: 'string', default: 'gradepass-local-secret' },
    'redirect-uri': {
      type: 'string',
      multiple: true,
      default: ['http://127.0.0.1:5170/api/auth/google/callback', 'http://localhost:5170/api/auth/google/callback'],
    },
    help: { type: 'boolean', default: false },
  },
});

if (values.help || !values.data) {
  process.stdout.write(`${usage}\n`);
  process.exit(values.help ? 0 : 2);
}

const port = (name: string, value: string) => {
  const n = Number(value);
  if (!Number.isInteger(n) || n < 0 || n > 65535) throw new Error(`--${name} must be a port number, got "${value}"`);
  return n;
};

const standIns = await startStandIns({
  dataDir: values.data,
  host: values.host,
  s3Port: port('s3-port', values['s3-port']),
  smtpPort: port('smtp-port', values['smtp-port']),
  mailWebPort: port('mail-web-port', values['mail-web-port']),
  oauthPort: port('oauth-port', values['oauth-port']),
  bucket: values.bucket,
  allowedOrigins: values.origin,
  oauth: {
    clientId: values['client-id'],
    clientSecret: values['client-secret'],
    redirectUris: values['redirect-uri'],
    identities: [
      { email: 'admin@gradepass.test', name: 'Avery Stone', role: 'admin' },
      { email: 'office@gradepass.test', name: 'Olive Marsh', role: 'staff' },
      { email: 'crew@gradepass.test', name: 'Cal Brook', role: 'crew' },
      { email: 'owner@example.test', name: 'River Fields', role: 'applicant' },
    ],
  },
});

const { s3, mail, oauth } = standIns;
process.stdout.write(`Gradepass stand-ins are running (Ctrl-C stops them):
  Storage (S3)   ${s3.endpoint}  bucket ${s3.bucket}, key ${s3.accessKeyId}/${s3.secretAccessKey}, region ${s3.region}
  Mail (SMTP)    ${mail.smtpHost}:${mail.smtpPort}
  Mail (web)     ${mail.webUrl}
  Sign-in        ${oauth.issuer}  client ${values['client-id']}
    authorize    ${oauth.authorizationUrl}
    token        ${oauth.tokenUrl}
    userinfo     ${oauth.userinfoUrl}
`);

let stopping = false;
const shutdown = (signal: string) => {
  if (stopping) return;
  stopping = true;
  process.stdout.write(`\n${signal}: stopping the stand-ins...\n`);
  standIns.stop().then(
    () => process.exit(0),
    (error: unknown) => {
      process.stderr.write(`Stopping failed: ${String(error)}\n`);
      process.exit(1);
    },
  );
};
process.on('SIGINT', () => shutdown('SIGINT'));
process.on('SIGTERM', () => shutdown('SIGTERM'));
