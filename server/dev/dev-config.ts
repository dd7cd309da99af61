/** Fixed local ports for `npm start`, each overridable; tests pick free ports of their own instead. */
export const devPorts = {
  app: Number(process.env.PORT ?? 5170),
  postgres: Number(process.env.PG_PORT ?? 54329),
  s3: Number(process.env.S3_PORT ?? 54330),
  smtp: Number(process.env.SMTP_PORT ?? 54325),
  mailWeb: Number(process.env.MAIL_WEB_PORT ?? 54326),
  oauth: Number(process.env.OAUTH_PORT ?? 54327),
  payments: Number(process.env.PAYMENTS_PORT ?? 54328),
};

export const devOAuthClient = { clientId: 'gradepass-local', clientSecret: 'gradepass-local-secret' };
export const devBucket = 'gradepass-local';
