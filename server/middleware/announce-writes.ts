import type { RequestHandler } from 'express';
import onHeaders from 'on-headers';
import type { ChangeStamps } from '../config/context';

const reads = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * A write answered by this process may change what cached pages show: the stamp moves just before its answer
 * leaves, so whoever wrote reads their change on their very next request. Other processes hear PostgreSQL's notice
 * once the change commits.
 */
export function announceWrites(changes: ChangeStamps): RequestHandler {
  return (req, res, next) => {
    if (!reads.has(req.method)) onHeaders(res, () => changes.changed());
    next();
  };
}
