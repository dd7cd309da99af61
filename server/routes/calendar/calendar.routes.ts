import { Router } from 'express';
import { calendarQuerySchema, type CalendarAnswer } from '@shared/contracts/calendar';
import type { AppContext } from '../../config/context';
import { handle } from '../../lib/handle';
import { officeRoles, requireRole } from '../../middleware/require-role';
import { calendarEntries } from '../../services/calendar/calendar.service';

/** The office's calendar of site visits and crews' work days. */
export function calendarRouter({ db }: AppContext) {
  const router = Router();
  router.get(
    '/api/calendar',
    requireRole(...officeRoles),
    handle(
      { query: calendarQuerySchema },
      async ({ query }) =>
        ({
          entries: await calendarEntries(db, query),
        }) satisfies CalendarAnswer<Date>,
    ),
  );
  return router;
}
