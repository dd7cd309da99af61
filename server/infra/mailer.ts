import nodemailer from 'nodemailer';
import type { Env } from '../config/env';

export function createMailer(env: Env) {
  return nodemailer.createTransport({
    host: env.SMTP_HOST,
    port: env.SMTP_PORT,
    secure: env.SMTP_SECURE,
    auth: env.SMTP_USER ? { user: env.SMTP_USER, pass: env.SMTP_PASSWORD } : undefined,
    // A slow server is not a dead one: giving up while it still holds the reply to the end of the message is how a
    // message it did accept gets sent twice. RFC 5321 (4.5.3.2) suggests minutes for these waits (from memory);
    // the outbox lease is renewed for as long as the send takes, so waiting costs nothing but a worker slot.
    // nodemailer counts the greeting against connectionTimeout too, so both are long.
    connectionTimeout: 60_000,
    greetingTimeout: 60_000,
    socketTimeout: 120_000,
  });
}
