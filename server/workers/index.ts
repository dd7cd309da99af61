import type { AppContext } from '../config/context';
import { startEmailWorker, type EmailWorkerOptions } from './email-queue';
import { startUploadSweep } from './upload-sweep';

export interface Workers {
  stop(): Promise<void>;
}

/** Background work of this instance. Every instance may run it: the queue lives in PostgreSQL. */
export async function startWorkers(ctx: AppContext, options: { email?: EmailWorkerOptions } = {}): Promise<Workers> {
  const email = await startEmailWorker(ctx, options.email);
  const uploads = startUploadSweep(ctx);
  return {
    stop: () => {
      uploads.stop();
      return email.stop();
    },
  };
}
