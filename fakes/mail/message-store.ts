import { randomBytes } from 'node:crypto';
import { mkdir, readdir, readFile, rm, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import type { AddressObject, ParsedMail } from 'mailparser';

export interface StoredMessage {
  id: string;
  receivedAt: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string;
  headers: Record<string, string>;
  messageId: string;
  /** Files sent with the message; a text file (such as a calendar invitation) keeps its text. */
  attachments: { filename: string; contentType: string; size: number; text: string | null }[];
}

const idPattern = /^\d{13}-\d{6}-[0-9a-f]{8}$/;

/** Every caught message as one JSON file (plus the raw .eml), so the list survives a restart of the catcher. */
export class MessageStore {
  private sequence = 0;

  constructor(private readonly dir: string) {}

  async init(): Promise<void> {
    await mkdir(this.dir, { recursive: true });
  }

  async save(parsed: ParsedMail, raw: Buffer, envelopeTo: string[]): Promise<StoredMessage> {
    // Time first, then a counter: file names sort in arrival order even within one millisecond.
    const id = `${String(Date.now()).padStart(13, '0')}-${String(this.sequence++ % 1e6).padStart(6, '0')}-${randomBytes(4).toString('hex')}`;
    const headerTo = addresses(parsed.to);
    const message: StoredMessage = {
      id,
      receivedAt: new Date().toISOString(),
      from: parsed.from?.text ?? '',
      to: headerTo.length > 0 ? headerTo : envelopeTo,
      subject: parsed.subject ?? '',
      text: parsed.text ?? '',
      html: typeof parsed.html === 'string' ? parsed.html : '',
      headers: headerMap(parsed),
      messageId: parsed.messageId ?? '',
      attachments: parsed.attachments.map((a) => ({
        filename: a.filename ?? '',
        contentType: a.contentType,
        size: a.size,
        text: a.contentType.startsWith('text/') ? a.content.toString('utf8') : null,
      })),
    };
    await writeFile(join(this.dir, `${id}.eml`), raw);
    await writeFile(join(this.dir, `${id}.json`), JSON.stringify(message, null, 2));
    return message;
  }

  /** Oldest first. */
  async list(): Promise<StoredMessage[]> {
    const names = (await readdir(this.dir)).filter((name) => name.endsWith('.json')).sort();
    return Promise.all(
      names.map(async (name) => JSON.parse(await readFile(join(this.dir, name), 'utf8')) as StoredMessage),
    );
  }

  async get(id: string): Promise<StoredMessage | undefined> {
    if (!idPattern.test(id)) return undefined;
    try {
      return JSON.parse(await readFile(join(this.dir, `${id}.json`), 'utf8')) as StoredMessage;
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code === 'ENOENT') return undefined;
      throw error;
    }
  }

  async clear(): Promise<void> {
    const names = await readdir(this.dir);
    await Promise.all(names.map((name) => rm(join(this.dir, name), { force: true })));
  }
}

function addresses(field: AddressObject | AddressObject[] | undefined): string[] {
  const groups = field === undefined ? [] : Array.isArray(field) ? field : [field];
  return groups.flatMap((group) => group.value.map((entry) => entry.address ?? '').filter(Boolean));
}

/** Header names in lower case with their raw (unfolded) values; repeated headers are joined by newlines. */
function headerMap(parsed: ParsedMail): Record<string, string> {
  const map: Record<string, string> = {};
  for (const { key, line } of parsed.headerLines) {
    const value = line
      .slice(line.indexOf(':') + 1)
      .replace(/\r?\n[ \t]+/g, ' ')
      .trim();
    map[key] = key in map ? `${map[key]}\n${value}` : value;
  }
  return map;
}
