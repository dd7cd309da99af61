import type { Express } from 'express';
import type { AppContext } from '../context';
import { emailsRouter } from './emails/emails.routes';
import { healthRouter } from './health/health.routes';
import { transitionsRouter } from './transitions/transitions.routes';
import { usersRouter } from './users/users.routes';

/** Every resource's router, in one list. */
export function registerRoutes(app: Express, ctx: AppContext) {
  app.use(healthRouter(ctx));
  app.use(usersRouter(ctx));
  app.use(transitionsRouter(ctx));
  app.use(emailsRouter(ctx));
}
