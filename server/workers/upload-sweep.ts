import { DeleteObjectCommand } from '@aws-sdk/client-s3';
import { and, asc, eq, lt } from 'drizzle-orm';
import type { AppContext } from '../config/context';
import { photos } from '../db/schema';

type SweepContext = Pick<AppContext, 'db' | 's3' | 'env' | 'logger'>;

const batch = 200;
const everyMs = 15 * 60_000;

/**
 * Deletes photos that were announced but never confirmed, from storage and from the table, once they are
 * UNCONFIRMED_UPLOAD_HOURS old (far past the upload link's five minutes). Safe on every instance at once: each row is
 * claimed by one conditional update before its object is touched, and a late confirmation finds it gone. Returns
 * how many it removed.
 */
export async function sweepUnconfirmedUploads(ctx: SweepContext, now = new Date()): Promise<number> {
  const cutoff = new Date(now.getTime() - ctx.env.UNCONFIRMED_UPLOAD_HOURS * 3_600_000);
  const stale = await ctx.db
    .select({ id: photos.id, objectKey: photos.objectKey })
    .from(photos)
    .where(and(eq(photos.status, 'pending'), lt(photos.createdAt, cutoff)))
    .orderBy(asc(photos.createdAt))
    .limit(batch);
  let removed = 0;
  for (const photo of stale) {
    const [claimed] = await ctx.db
      .update(photos)
      .set({ status: 'removed' })
      .where(and(eq(photos.id, photo.id), eq(photos.status, 'pending')))
      .returning({ id: photos.id });
    if (!claimed) continue;
    // Deleting a key that was never uploaded succeeds too.
    await ctx.s3.send(new DeleteObjectCommand({ Bucket: ctx.env.S3_BUCKET, Key: photo.objectKey }));
    await ctx.db.delete(photos).where(eq(photos.id, photo.id));
    removed += 1;
  }
  return removed;
}

/** Runs the sweep a minute after start and then every quarter hour, in the background of this instance. */
export function startUploadSweep(ctx: SweepContext) {
  const run = () => {
    sweepUnconfirmedUploads(ctx)
      .then((removed) => {
        if (removed > 0) ctx.logger.info({ removed }, 'removed unconfirmed uploads');
      })
      .catch((error: unknown) =>
        ctx.logger.warn({ err: error }, 'the clean-up of unconfirmed uploads failed; it runs again later'),
      );
  };
  const first = setTimeout(run, 60_000);
  const timer = setInterval(run, everyMs);
  first.unref();
  timer.unref();
  return {
    stop: () => {
      clearTimeout(first);
      clearInterval(timer);
    },
  };
}
