import { join } from 'node:path';
import { close, defaultHost, listen, urlFor } from '../lib/listen.js';
import { createMailWeb } from './mail-web.js';
import { MessageStore } from './message-store.js';
import { SmtpListener } from './smtp-listener.js';

export interface MailStandInOptions {
  /** This service's own folder; messages are kept in it across restarts. */
  dir: string;
  host?: string;
  smtpPort?: number;
  webPort?: number;
}

export interface MailStandIn {
  smtpHost: string;
  smtpPort: number;
  webUrl: string;
  /** Takes only the SMTP listener down (sending then fails); the web page and stored messages stay. */
  stopSmtp(): Promise<void>;
  /** Brings the SMTP listener back on the same port. */
  startSmtp(): Promise<void>;
  /**
   * Holds each SMTP reply this many milliseconds (0 for none). The message is stored before the final reply is
   * held, as a real server may have accepted it while the sender still waits.
   */
  setReplyDelay(ms: number): void;
  stop(): Promise<void>;
}

export async function startMailStandIn(options: MailStandInOptions): Promise<MailStandIn> {
  const host = options.host ?? defaultHost;
  const store = new MessageStore(join(options.dir, 'messages'));
  await store.init();
  const smtp = new SmtpListener(store, host, options.smtpPort ?? 0);
  await smtp.start();
  const web = createMailWeb(store);
  let webPort: number;
  try {
    webPort = await listen(web, options.webPort ?? 0, host);
  } catch (error) {
    await smtp.stop();
    throw error;
  }
  return {
    smtpHost: host,
    smtpPort: smtp.port,
    webUrl: urlFor(host, webPort),
    stopSmtp: () => smtp.stop(),
    startSmtp: () => smtp.start(),
    setReplyDelay: (ms: number) => {
      smtp.replyDelayMs = ms;
    },
    async stop() {
      await smtp.stop();
      await close(web);
    },
  };
}
