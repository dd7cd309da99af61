import { allowedTransitions } from '@shared/workflow/transitions';
import { isOfficeRole, statusText } from '@shared/workflow/statuses';
import type { SessionUser } from '../../lib/session-user';
import type { RequestRow } from './request-access';
import type { OfficeRequestView, RequestView } from '@shared/contracts/requests';
import type { ApplicationDraft } from '@shared/requests/application-schema';

export const isOffice = (user: SessionUser) => isOfficeRole(user.role);

/** The applicant's part at each status, in the words of the "My requests" table. */
export function expectedOfApplicant(status: RequestRow['status']): string {
  if (status === 'draft') return 'Finish the form and send it';
  if (status === 'needs_details') return 'Answer the office’s question';
  return 'Nothing for now';
}

/**
 * One request as its reader may see it. Everything the applicant gave goes to everyone who can see the request;
 * the office's own bookkeeping (assignee, crew, jurisdiction) only to the office.
 */
export function requestView(row: RequestRow, user: SessionUser): RequestView<Date> | OfficeRequestView<Date> {
  const base: RequestView<Date> = {
    id: row.id,
    reference: row.reference,
    status: row.status,
    statusLabel: statusText[row.status].label,
    whatNext: statusText[row.status].next,
    version: row.version,
    wizardStep: row.wizardStep,
    // Written only through the wizard's schema (drafts.service), so it has that shape.
    application: row.application as ApplicationDraft,
    applicantName: row.applicantName,
    siteAddress: row.siteAddress,
    roadName: row.roadName,
    siteLat: row.siteLat,
    siteLng: row.siteLng,
    visitAt: row.visitAt,
    permitReference: row.permitReference,
    permitDecidedOn: row.permitDecidedOn,
    permitConditions: row.permitConditions,
    permitExpiresOn: row.permitExpiresOn,
    submittedAt: row.submittedAt,
    statusChangedAt: row.statusChangedAt,
    createdAt: row.createdAt,
    updatedAt: row.updatedAt,
    actions: allowedTransitions(row.status, user.role).map(({ action, label, needs, to }) => ({
      action,
      label,
      needs,
      to,
    })),
  };
  if (!isOffice(user)) return base;
  return {
    ...base,
    applicantId: row.applicantId,
    assigneeId: row.assigneeId,
    crewId: row.crewId,
    jurisdictionId: row.jurisdictionId,
  } satisfies OfficeRequestView<Date>;
}
