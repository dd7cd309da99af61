import type { RequestHandler } from 'express';
import { AppError } from '../lib/errors';

const changes = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);

/**
 * Every change must come from our own pages. Browsers send Origin on every POST, PUT, PATCH and DELETE, with or
 * without a body, so a page on another site, a sibling subdomain or another port of this host is refused whatever
 * SameSite lets through. Fetch Metadata covers a browser that leaves Origin out. A request with neither header
 * is not from a browser page (a script, a health probe) and carries no one's cookie by accident.
 */
export function requireSameOrigin(appOrigin: string): RequestHandler {
  const expected = new URL(appOrigin).origin;
  return (req, _res, next) => {
    if (!changes.has(req.method)) return next();
    const origin = req.headers.origin;
    const site = req.headers['sec-fetch-site'];
    const ours = origin !== undefined ? origin === expected : site === undefined || site === 'same-origin';
    if (ours) return next();
    next(
      new AppError(
        403,
        'cross_site',
        'This change was sent from another site, so it was refused. Make it from the Gradepass pages themselves.',
      ),
    );
  };
}

/** API answers are personal and change with every action: no browser or proxy may keep a copy. */
export const noStore: RequestHandler = (_req, res, next) => {
  res.setHeader('Cache-Control', 'no-store');
  next();
};
