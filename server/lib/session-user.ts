import type { Role } from '@shared/workflow/statuses';

/** What a signed-in request carries as `req.user`: loaded fresh from the database on every request. */
export interface SessionUser {
  id: string;
  email: string;
  name: string;
  role: Role;
}

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    // eslint-disable-next-line @typescript-eslint/no-empty-object-type
    interface User extends SessionUser {}
  }
}
