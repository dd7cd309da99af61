import { submittedApplicationSchema } from '../../../shared/requests/application-schema';
import { badRequest } from '../../lib/errors';
import { zodFields } from '../../lib/handle';
import type { RequestRow } from './request-access';

/**
 * A request may go to the office only with a complete application. Fields are named as the wizard names them
 * (`site.address`, `entrance.vehicles`), so the browser can put each message next to its field.
 */
export function assertReadyToSubmit(row: Pick<RequestRow, 'application'>): void {
  const result = submittedApplicationSchema.safeParse(row.application ?? {});
  if (result.success) return;
  const fields = zodFields(result.error);
  throw badRequest(`The form is not finished yet: check ${Object.keys(fields).join(', ')}.`, fields);
}
