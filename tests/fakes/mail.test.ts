import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import nodemailer, { type SendMailOptions } from 'nodemailer';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { StoredMessage } from '../../fakes/mail/message-store.js';
import { startMailStandIn, type MailStandIn } from '../../fakes/mail/start-mail.js';

let dir: string;
let mail: MailStandIn;

const transport = () =>
  nodemailer.createTransport({ host: mail.smtpHost, port: mail.smtpPort, secure: false, connectionTimeout: 2000 });

async function send(subject: string, extra: Partial<SendMailOptions> = {}) {
  return transport().sendMail({
    from: 'Gradepass <office@gradepass.test>',
    to: 'owner@example.test',
    subject,
    text: `Body of ${subject}`,
    ...extra,
  });
}

async function messages(): Promise<StoredMessage[]> {
  return (await fetch(`${mail.webUrl}/api/messages`)).json() as Promise<StoredMessage[]>;
}

beforeAll(async () => {
  dir = await mkdtemp(join(tmpdir(), 'gradepass-mail-'));
  mail = await startMailStandIn({ dir });
});

afterAll(async () => {
  await mail?.stop();
  await rm(dir, { recursive: true, force: true });
});

describe('mail catcher', () => {
  it('keeps a message sent by nodemailer and serves it as JSON', async () => {
    const subject = `Receipt ${crypto.randomUUID()}`;
    const info = await send(subject, { html: '<p>Your request <b>was received</b>.</p>', cc: 'office@gradepass.test' });
    const found = (await messages()).find((m) => m.subject === subject);
    expect(found).toMatchObject({
      from: '"Gradepass" <office@gradepass.test>',
      to: ['owner@example.test'],
      text: expect.stringContaining(`Body of ${subject}`),
      html: expect.stringContaining('<b>was received</b>'),
      messageId: info.messageId,
    });
    expect(found?.headers.subject).toBe(subject);
    expect(new Date(found!.receivedAt).getTime()).toBeGreaterThan(Date.now() - 60_000);
    const one = await fetch(`${mail.webUrl}/api/messages/${found!.id}`);
    expect(await one.json()).toEqual(found);
  });

  it('plays a slow server when told to: the message is kept while its final reply is still held', async () => {
    const subject = `Slow ${crypto.randomUUID()}`;
    mail.setReplyDelay(1_500);
    let answered = false;
    const sending = nodemailer
      .createTransport({ host: mail.smtpHost, port: mail.smtpPort, secure: false, connectionTimeout: 20_000 })
      .sendMail({ from: 'office@gradepass.test', to: 'owner@example.test', subject, text: 'Slow.' })
      .then((info) => {
        answered = true;
        return info;
      });
    try {
      for (let kept = false; !kept; kept = (await messages()).some((m) => m.subject === subject)) {
        await new Promise((resolve) => setTimeout(resolve, 100));
      }
      expect(answered).toBe(false);
      await sending;
      expect(answered).toBe(true);
    } finally {
      mail.setReplyDelay(0);
    }
  });

  it('lists messages oldest first in JSON and newest first on the page', async () => {
    const first = `First ${crypto.randomUUID()}`;
    const second = `Second ${crypto.randomUUID()}`;
    await send(first);
    await send(second);
    const subjects = (await messages()).map((m) => m.subject);
    expect(subjects.indexOf(first)).toBeLessThan(subjects.indexOf(second));
    const html = await (await fetch(mail.webUrl)).text();
    expect(html).toContain('Caught e-mail');
    expect(html.indexOf(second)).toBeLessThan(html.indexOf(first));
  });

  it('escapes message content on its pages and frames the HTML part in a sandbox', async () => {
    const subject = `<script>alert(1)</script> ${crypto.randomUUID()}`;
    await send(subject, { html: '<p onclick="x()">hi</p><script>bad()</script>' });
    const found = (await messages()).find((m) => m.subject === subject)!;
    const list = await (await fetch(mail.webUrl)).text();
    expect(list).not.toContain('<script>alert(1)</script>');
    const detail = await (await fetch(`${mail.webUrl}/messages/${found.id}`)).text();
    expect(detail).toContain('&lt;script&gt;alert(1)&lt;/script&gt;');
    expect(detail).toMatch(/<iframe[^>]*sandbox[^>]*src="\/messages\/[^"]+\/html"/);
    const framed = await fetch(`${mail.webUrl}/messages/${found.id}/html`);
    expect(framed.headers.get('content-security-policy')).toContain('sandbox');
  });

  it('answers 404 for an unknown id', async () => {
    expect((await fetch(`${mail.webUrl}/api/messages/0000000000000-000000-00000000`)).status).toBe(404);
    expect((await fetch(`${mail.webUrl}/api/messages/..%2F..%2Fetc`)).status).toBe(404);
  });

  it('fails to send while SMTP is stopped, works again after restart, and keeps old messages', async () => {
    const before = `Before outage ${crypto.randomUUID()}`;
    await send(before);
    const port = mail.smtpPort;
    await mail.stopSmtp();
    try {
      await expect(send('During outage')).rejects.toThrow();
      expect((await fetch(mail.webUrl)).status).toBe(200);
    } finally {
      await mail.startSmtp();
    }
    expect(mail.smtpPort).toBe(port);
    const after = `After outage ${crypto.randomUUID()}`;
    await send(after);
    const subjects = (await messages()).map((m) => m.subject);
    expect(subjects).toEqual(expect.arrayContaining([before, after]));
    expect(subjects).not.toContain('During outage');
  });

  it('keeps messages across a restart of the whole catcher', async () => {
    const subject = `Durable ${crypto.randomUUID()}`;
    const restartedDir = await mkdtemp(join(tmpdir(), 'gradepass-mail-restart-'));
    try {
      const first = await startMailStandIn({ dir: restartedDir });
      await nodemailer
        .createTransport({ host: first.smtpHost, port: first.smtpPort })
        .sendMail({ from: 'a@gradepass.test', to: 'b@example.test', subject, text: 'x' });
      await first.stop();
      const second = await startMailStandIn({ dir: restartedDir });
      const kept = (await (await fetch(`${second.webUrl}/api/messages`)).json()) as StoredMessage[];
      await second.stop();
      expect(kept.map((m) => m.subject)).toEqual([subject]);
    } finally {
      await rm(restartedDir, { recursive: true, force: true });
    }
  });

  it('clears all messages on DELETE', async () => {
    const own = await mkdtemp(join(tmpdir(), 'gradepass-mail-clear-'));
    const catcher = await startMailStandIn({ dir: own });
    try {
      await nodemailer
        .createTransport({ host: catcher.smtpHost, port: catcher.smtpPort })
        .sendMail({ from: 'a@gradepass.test', to: 'b@example.test', subject: 'gone soon', text: 'x' });
      expect((await fetch(`${catcher.webUrl}/api/messages`, { method: 'DELETE' })).status).toBe(204);
      expect(await (await fetch(`${catcher.webUrl}/api/messages`)).json()).toEqual([]);
    } finally {
      await catcher.stop();
      await rm(own, { recursive: true, force: true });
    }
  });
});
