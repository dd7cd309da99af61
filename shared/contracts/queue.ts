// The office queue: what GET /api/queue takes and what it answers, shared by the server's handler and the client.
import { z } from 'zod';
import { requestStatusSchema, type RequestStatus, type Role } from '../workflow/statuses';

export const queueSorts = ['waiting', 'reference', 'applicant', 'road', 'created'] as const;
export type QueueSort = (typeof queueSorts)[number];

const csv = <T extends z.ZodType>(item: T, what: string) =>
  z
    .string({ error: `give each ${what} once in one list, separated by commas` })
    .max(400, 'must be at most 400 characters')
    .optional()
    .transform((value, ctx) => {
      if (!value) return undefined;
      const parsed: z.infer<T>[] = [];
      for (const part of value
        .split(',')
        .map((p) => p.trim())
        .filter(Boolean)) {
        const result = item.safeParse(part);
        if (!result.success) ctx.addIssue({ code: 'custom', message: `"${part}" is not a known ${what}` });
        else parsed.push(result.data);
      }
      return parsed.length ? parsed : undefined;
    });

export const queueQuerySchema = z.object({
  status: csv(requestStatusSchema, 'status'),
  /** A jurisdiction id, or "none" for requests not yet matched to one. */
  jurisdiction: z.union([z.uuid(), z.literal('none')], { error: 'must be a jurisdiction id or "none"' }).optional(),
  /** A person's id, "me", or "none" for unassigned requests. */
  assignee: z
    .union([z.uuid(), z.literal('me'), z.literal('none')], { error: 'must be a person id, "me" or "none"' })
    .optional(),
  waiting: z
    .enum(['true', 'false'], { error: 'must be true or false' })
    .optional()
    .transform((v) => v === 'true'),
  q: z.string().trim().max(120, 'must be at most 120 characters').optional(),
  sort: z.enum(queueSorts, { error: `must be one of: ${queueSorts.join(', ')}` }).default('waiting'),
  dir: z.enum(['asc', 'desc'], { error: 'must be asc or desc' }).default('asc'),
  cursor: z.string().max(400).optional(),
  limit: z.coerce
    .number('must be a number')
    .int('must be a whole number')
    .min(1, 'must be at least 1')
    .max(100, 'must be at most 100')
    .default(50),
});
export type QueueQuery = z.infer<typeof queueQuerySchema>;

/** One request as the queue lists it; `statusChangedAt` is ISO text made by PostgreSQL. */
export interface QueueRow {
  id: string;
  reference: string;
  status: RequestStatus;
  statusLabel: string;
  applicantName: string;
  roadName: string;
  statusChangedAt: string;
  waitingOnUs: boolean;
  nextAction: string;
  jurisdiction: { id: string; name: string } | null;
  assignee: { id: string; name: string } | null;
}

/** `total` is counted on the first page only (later pages leave it null) and only up to a cap (`totalIsCapped`). */
export interface QueuePage {
  requests: QueueRow[];
  nextCursor: string | null;
  total: number | null;
  totalIsCapped: boolean;
}

export interface OfficePerson {
  id: string;
  name: string;
  role: Role;
}
export interface QueueOptions {
  jurisdictions: { id: string; name: string }[];
  people: OfficePerson[];
}
