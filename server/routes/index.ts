import type { Express } from 'express';
import type { AppContext } from '../config/context';
import { auditRouter } from './audit/audit.routes';
import { calendarRouter } from './calendar/calendar.routes';
import { crewRouter } from './crew/crew.routes';
import { documentsRouter } from './documents/documents.routes';
import { emailsRouter } from './emails/emails.routes';
import { gradeChecksRouter } from './grade-checks/grade-checks.routes';
import { healthRouter } from './health/health.routes';
import { inspectionsRouter } from './inspections/inspections.routes';
import { messagesRouter } from './messages/messages.routes';
import { paymentsRouter } from './payments/payments.routes';
import { crewPhotosRouter } from './photos/crew-photos.routes';
import { permitsRouter } from './permits/permits.routes';
import { photosRouter } from './photos/photos.routes';
import { requestsRouter } from './requests/requests.routes';
import { ruleProfilesRouter } from './rule-profiles/rule-profiles.routes';
import { queueRouter } from './queue/queue.routes';
import { quotesRouter } from './quotes/quotes.routes';
import { rateCardsRouter } from './rate-cards/rate-cards.routes';
import { transitionsRouter } from './transitions/transitions.routes';
import { usersRouter } from './users/users.routes';

/** Every resource's router, in one list. */
export function registerRoutes(app: Express, ctx: AppContext) {
  app.use(healthRouter(ctx));
  app.use(crewRouter(ctx));
  app.use(usersRouter(ctx));
  app.use(auditRouter(ctx));
  app.use(requestsRouter(ctx));
  app.use(photosRouter(ctx));
  app.use(crewPhotosRouter(ctx));
  app.use(messagesRouter(ctx));
  app.use(transitionsRouter(ctx));
  app.use(emailsRouter(ctx));
  app.use(queueRouter(ctx));
  app.use(ruleProfilesRouter(ctx));
  app.use(gradeChecksRouter(ctx));
  app.use(documentsRouter(ctx));
  app.use(calendarRouter(ctx));
  app.use(rateCardsRouter(ctx));
  app.use(quotesRouter(ctx));
  app.use(paymentsRouter(ctx));
  app.use(inspectionsRouter(ctx));
  app.use(permitsRouter(ctx));
}
