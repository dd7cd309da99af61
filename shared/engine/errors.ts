import type { z } from 'zod';

export interface EngineIssue {
  field: string;
  message: string;
}

/**
 * The one error the engine throws for input it cannot compute from. `field` is a dotted path into the
 * input (e.g. "profile.points.3.stationFt") so a form can put the message next to the right box.
 */
export class EngineInputError extends Error {
  readonly field: string;
  readonly issues: EngineIssue[];

  constructor(field: string, message: string, issues?: EngineIssue[]) {
    super(field ? `${field}: ${message}` : message);
    this.name = 'EngineInputError';
    this.field = field;
    this.issues = issues ?? [{ field, message }];
  }
}

const joinPath = (root: string, path: readonly PropertyKey[]): string =>
  [root, ...path.map(String)].filter((part) => part !== '').join('.');

export function parseInput<S extends z.ZodType>(schema: S, input: unknown, root = ''): z.output<S> {
  const result = schema.safeParse(input);
  if (result.success) return result.data;
  const issues = result.error.issues.map((issue) => ({
    field: joinPath(root, issue.path),
    message: issue.message,
  }));
  throw new EngineInputError(issues[0].field, issues[0].message, issues);
}

/** Last guard against overflow: an answer that is not a finite number is refused, never returned. */
export function requireFinite(value: number, field: string, what: string): number {
  if (!Number.isFinite(value)) {
    throw new EngineInputError(field, `${what} cannot be computed from these values (out of range)`);
  }
  return value;
}
