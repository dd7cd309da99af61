import { z } from 'zod';

const count = z.coerce.number().int().min(1);

/**
 * The environment for sessions, request limits and storage clean-up, spread into the one schema in server/config/env.ts.
 * Defaults are meant for production; tests raise the limits they do not test.
 */
export const securityEnvShape = {
  /** A session ends after this many minutes without a request, and in any case this many days after sign-in. */
  SESSION_IDLE_MINUTES: z.coerce.number().positive().default(120),
  SESSION_MAX_DAYS: z.coerce.number().positive().default(14),
  /** Per signed-in person; one address (an office behind one router) gets RATE_LIMIT_ADDRESS_FACTOR times as many. */
  RATE_LIMIT_API_PER_MINUTE: count.default(300),
  RATE_LIMIT_MESSAGES_PER_HOUR: count.default(30),
  RATE_LIMIT_DRAFTS_PER_HOUR: count.default(10),
  RATE_LIMIT_UPLOADS_PER_HOUR: count.default(120),
  /** Sign-in starts are anonymous, so this one counts per address only. */
  RATE_LIMIT_SIGN_INS_PER_HOUR: count.default(60),
  /** The inspector's page answers anyone holding a link, so it counts per address: reads, and outcomes recorded. */
  RATE_LIMIT_INSPECTOR_PER_HOUR: count.default(240),
  RATE_LIMIT_INSPECTOR_OUTCOMES_PER_HOUR: count.default(20),
  RATE_LIMIT_ADDRESS_FACTOR: count.default(5),
  /** Photos announced but never confirmed are deleted from storage after this many hours. */
  UNCONFIRMED_UPLOAD_HOURS: z.coerce.number().positive().default(24),
};
