import { submittedApplicationSchema } from '@shared/requests/application-schema';
import { fieldLabelsOf, fieldsSentence } from '@shared/contracts/field-labels';
import { AppError } from '../../lib/errors';
import { zodFields } from '../../lib/handle';
import type { RequestRow } from './request-access';

/**
 * A request may go to the office only with a complete application. Fields are named as the wizard names them
 * (`site.address`, `entrance.vehicles`), so the browser can put each message next to its field.
 */
export function assertReadyToSubmit(row: Pick<RequestRow, 'application'>): void {
  // A step never opened still gets one message per field, not one for the whole step.
  const saved = (row.application ?? {}) as { site?: unknown; entrance?: unknown };
  const result = submittedApplicationSchema.safeParse({ site: saved.site ?? {}, entrance: saved.entrance ?? {} });
  if (result.success) return;
  const fields = zodFields(result.error);
  const labels = fieldLabelsOf(fields, submittedApplicationSchema);
  throw new AppError(
    400,
    'bad_request',
    `The form is not finished yet. ${fieldsSentence(fields, labels)}`,
    fields,
    labels,
  );
}
