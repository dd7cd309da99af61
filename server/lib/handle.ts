import type { NextFunction, Request, RequestHandler, Response } from 'express';
import { z } from 'zod';
import type { SessionUser } from './session-user';
import { AppError, unauthenticated } from './errors';
import { plainIssueMessage } from '@shared/errors/issue-words';
import { fieldLabelOf, fieldLabelsOf, fieldsSentence } from '@shared/contracts/field-labels';

/** Turn zod issues into `{ "field.path": "message" }`, the shape every 400 carries, in plain words. */
export function zodFields(error: z.ZodError): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = issue.path.length > 0 ? issue.path.join('.') : '(body)';
    fields[key] ??= plainIssueMessage(issue);
  }
  return fields;
}

/** A 400 naming each field by its label (from `schema` where it gives one) and saying what is allowed. */
export function invalidInput(fields: Record<string, string>, schema?: z.ZodType): AppError {
  const labels = fieldLabelsOf(fields, schema);
  return new AppError(400, 'invalid_input', fieldsSentence(fields, labels), fields, labels);
}

export function parseOrThrow<T extends z.ZodType>(schema: T, value: unknown): z.infer<T> {
  const result = schema.safeParse(value);
  if (!result.success) throw invalidInput(zodFields(result.error), schema);
  return result.data;
}

const deepestBody = 32;

/**
 * Fields whose text holds a NUL character or a lone UTF-16 surrogate, which PostgreSQL cannot store in text or
 * jsonb. Walked with a list rather than recursion, and no deeper than any contract goes, so a pathologically nested
 * body costs nothing.
 */
export function nulFields(value: unknown): Record<string, string> {
  const fields: Record<string, string> = {};
  const pending: [unknown, string, number][] = [[value, '', 0]];
  while (pending.length > 0) {
    const [item, path, depth] = pending.pop()!;
    const key = path || '(body)';
    if (typeof item === 'string') {
      if (item.includes('\u0000')) fields[key] ??= 'must not contain a NUL character';
      else if (!(item as string & { isWellFormed(): boolean }).isWellFormed())
        fields[key] ??= 'holds a broken character (a lone UTF-16 surrogate)';
    } else if (item && typeof item === 'object') {
      if (depth >= deepestBody) {
        fields[key] ??= 'is nested too deeply';
        continue;
      }
      for (const [name, child] of Object.entries(item)) {
        if (name.includes('\u0000')) fields[key] ??= 'names must not contain a NUL character';
        else pending.push([child, path ? `${path}.${name}` : name, depth + 1]);
      }
    }
  }
  return fields;
}

interface Contract<B extends z.ZodType, Q extends z.ZodType, P extends z.ZodType> {
  body?: B;
  query?: Q;
  params?: P;
}

interface Input<B, Q, P> {
  body: B;
  query: Q;
  params: P;
  user: SessionUser;
  req: Request;
  res: Response;
}

/**
 * One route handler: validates body, query and params with their zod contracts and hands the parsed values on,
 * so nothing downstream parses them again. The caller must be signed in; role checks happen in the router.
 */
export function handle<
  B extends z.ZodType = z.ZodUnknown,
  Q extends z.ZodType = z.ZodUnknown,
  P extends z.ZodType = z.ZodUnknown,
>(
  contract: Contract<B, Q, P>,
  fn: (input: Input<z.infer<B>, z.infer<Q>, z.infer<P>>) => Promise<unknown>,
): RequestHandler {
  return handler(
    contract,
    (input, req) => fn({ ...input, user: req.user as SessionUser }),
    (req) => {
      if (!req.user) throw unauthenticated();
    },
  );
}

/**
 * The same for the few addresses that need no account (the inspector's page, which carries its own proof): no
 * `user` is handed on, so nothing downstream can mistake the caller for a signed-in person.
 */
export function handlePublic<
  B extends z.ZodType = z.ZodUnknown,
  Q extends z.ZodType = z.ZodUnknown,
  P extends z.ZodType = z.ZodUnknown,
>(
  contract: Contract<B, Q, P>,
  fn: (input: Omit<Input<z.infer<B>, z.infer<Q>, z.infer<P>>, 'user'>) => Promise<unknown>,
): RequestHandler {
  return handler(contract, (input) => fn(input));
}

function handler<B extends z.ZodType, Q extends z.ZodType, P extends z.ZodType>(
  contract: Contract<B, Q, P>,
  fn: (input: Omit<Input<z.infer<B>, z.infer<Q>, z.infer<P>>, 'user'>, req: Request) => Promise<unknown>,
  gate?: (req: Request) => void,
): RequestHandler {
  return async (req: Request, res: Response, next: NextFunction) => {
    try {
      gate?.(req);
      // Check all three parts before answering, so one 400 names every bad field at once.
      const fields: Record<string, string> = {};
      const labels: Record<string, string> = {};
      const part = <T extends z.ZodType>(schema: T | undefined, value: unknown, prefix: string) => {
        if (!schema) return value;
        const result = schema.safeParse(value);
        if (result.success) return result.data;
        for (const [key, message] of Object.entries(zodFields(result.error))) {
          fields[prefix + key] ??= message;
          labels[prefix + key] ??= fieldLabelOf(key, schema, value);
        }
        return undefined;
      };
      Object.assign(fields, nulFields(req.query), nulFields(req.body));
      const params = part(contract.params, req.params, '') as z.infer<P>;
      const query = part(contract.query, req.query, '') as z.infer<Q>;
      const body = part(contract.body, req.body ?? {}, '') as z.infer<B>;
      if (Object.keys(fields).length > 0) {
        const named = { ...fieldLabelsOf(fields), ...labels };
        throw new AppError(400, 'invalid_input', fieldsSentence(fields, named), fields, named);
      }
      const result = await fn({ body, query, params, req, res }, req);
      if (!res.headersSent) {
        if (result === undefined) res.status(204).end();
        else res.json(result);
      }
    } catch (error) {
      next(error);
    }
  };
}

export const uuidParam = z.object({ id: z.uuid('must be a valid id') });
