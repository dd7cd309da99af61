import type { z } from 'zod';
import { plainIssueMessage } from '../errors/issue-words';

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

/** The engine's answer, or null where it refuses the input; any other error is a bug and goes on. */
export function unlessRefused<T>(run: () => T): T | null {
  try {
    return run();
  } catch (error) {
    if (error instanceof EngineInputError) return null;
    throw error;
  }
}

const joinPath = (root: string, path: readonly PropertyKey[]): string =>
  [root, ...path.map(String)].filter((part) => part !== '').join('.');

type Issue = z.core.$ZodIssue;

/**
 * A union (e.g. the three profile forms) fails as one vague "invalid input" at its root. The branch that got
 * furthest into the value is the form the user meant, so its own issues are reported instead.
 */
function specific(issue: Issue, prefix: readonly PropertyKey[]): { path: PropertyKey[]; message: string }[] {
  const path = [...prefix, ...issue.path];
  if (issue.code !== 'invalid_union' || issue.errors.length === 0) return [{ path, message: plainIssueMessage(issue) }];
  const depth = (branch: Issue[]) => Math.max(...branch.map((i) => i.path.length));
  const best = issue.errors.reduce((a, b) => (depth(b) > depth(a) ? b : a));
  return best.flatMap((i) => specific(i, path));
}

export function parseInput<S extends z.ZodType>(schema: S, input: unknown, root = ''): z.output<S> {
  const result = schema.safeParse(input);
  if (result.success) return result.data;
  const issues = result.error.issues
    .flatMap((issue) => specific(issue, []))
    .map(({ path, message }) => ({ field: joinPath(root, path), message }));
  throw new EngineInputError(issues[0].field, issues[0].message, issues);
}

/** Last guard against overflow: an answer that is not a finite number is refused, never returned. */
export function requireFinite(value: number, field: string, what: string): number {
  if (!Number.isFinite(value)) {
    throw new EngineInputError(field, `${what} cannot be computed from these values (out of range)`);
  }
  return value;
}

/** Runs a nested engine call and re-roots any input error under the caller's field, e.g. "culvert.drainage". */
export function within<T>(prefix: string, run: () => T): T {
  try {
    return run();
  } catch (e) {
    if (e instanceof EngineInputError) {
      const reroot = (field: string) => (field ? `${prefix}.${field}` : prefix);
      const issues = e.issues.map((i) => ({ field: reroot(i.field), message: i.message }));
      throw new EngineInputError(reroot(e.field), issues[0]?.message ?? e.message, issues);
    }
    throw e;
  }
}
