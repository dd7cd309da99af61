import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import type { MessageStore } from './message-store.js';

const maxMessageBytes = 30 * 1024 * 1024;

/**
 * An SMTP listener that can be stopped and started again on the same port, so tests can take "the mail server"
 * down while the web page and the stored messages stay.
 */
export class SmtpListener {
  private server: SMTPServer | undefined;
  /** Holds every reply (greeting, MAIL, RCPT, end of DATA) this long, like a slow or overloaded mail server. */
  replyDelayMs = 0;

  constructor(
    private readonly store: MessageStore,
    private readonly host: string,
    public port: number,
  ) {}

  async start(): Promise<void> {
    if (this.server) return;
    const server = this.createServer();
    await new Promise<void>((resolve, reject) => {
      const netServer = server.listen(this.port, this.host);
      netServer.once('error', reject);
      netServer.once('listening', () => {
        netServer.off('error', reject);
        const address = netServer.address();
        if (address && typeof address === 'object') this.port = address.port;
        resolve();
      });
    });
    this.server = server;
  }

  async stop(): Promise<void> {
    const server = this.server;
    if (!server) return;
    this.server = undefined;
    await new Promise<void>((resolve) => server.close(() => resolve()));
  }

  private later(callback: () => void) {
    if (this.replyDelayMs <= 0) callback();
    else setTimeout(callback, this.replyDelayMs);
  }

  private createServer(): SMTPServer {
    const server = new SMTPServer({
      authOptional: true,
      disabledCommands: ['STARTTLS'],
      logger: false,
      banner: 'Gradepass mail catcher',
      size: maxMessageBytes,
      // Pending sessions are cut after a short grace period so stopSmtp() returns promptly in tests.
      closeTimeout: 500,
      onConnect: (_session, callback) => this.later(callback),
      onMailFrom: (_address, _session, callback) => this.later(callback),
      onRcptTo: (_address, _session, callback) => this.later(callback),
      onData: (stream, session, callback) => {
        const chunks: Buffer[] = [];
        stream.on('data', (chunk: Buffer) => chunks.push(chunk));
        stream.on('end', () => {
          if (stream.sizeExceeded) {
            callback(Object.assign(new Error('Message exceeds the size limit'), { responseCode: 552 }));
            return;
          }
          const raw = Buffer.concat(chunks);
          const envelopeTo = session.envelope.rcptTo.map((rcpt) => rcpt.address);
          simpleParser(raw)
            .then((parsed) => this.store.save(parsed, raw, envelopeTo))
            .then(
              () => this.later(callback),
              (error: Error) => callback(error),
            );
        });
      },
    });
    // Client hang-ups surface here; they are not the catcher's failure, and an unhandled 'error' would crash the process.
    server.on('error', () => undefined);
    return server;
  }
}
