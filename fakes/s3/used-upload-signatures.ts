import { appendFile, readFile } from 'node:fs/promises';

/**
 * Presigned PUT signatures that already carried one successful upload. Kept on disk so a URL stays spent across
 * a restart; entries past their expiry are dropped on load because the expiry check refuses them anyway.
 */
export class UsedUploadSignatures {
  private readonly spent = new Map<string, number>();
  private readonly inFlight = new Set<string>();

  private constructor(private readonly file: string) {}

  static async open(file: string, now = Date.now()): Promise<UsedUploadSignatures> {
    const store = new UsedUploadSignatures(file);
    const text = await readFile(file, 'utf8').catch((error: NodeJS.ErrnoException) => {
      if (error.code === 'ENOENT') return '';
      throw error;
    });
    for (const line of text.split('\n')) {
      const [signature, expiresAt] = line.split(' ');
      if (signature && Number(expiresAt) > now) store.spent.set(signature, Number(expiresAt));
    }
    return store;
  }

  /** Claims a signature for one upload attempt; false when it is spent or another attempt holds it right now. */
  claim(signature: string): boolean {
    if (this.spent.has(signature) || this.inFlight.has(signature)) return false;
    this.inFlight.add(signature);
    return true;
  }

  /** The upload failed, so the URL may be tried again. */
  release(signature: string): void {
    this.inFlight.delete(signature);
  }

  async markSpent(signature: string, expiresAt: number): Promise<void> {
    this.spent.set(signature, expiresAt);
    this.inFlight.delete(signature);
    await appendFile(this.file, `${signature} ${expiresAt}\n`);
  }
}
