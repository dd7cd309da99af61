import { isOfficeRole } from '../../../shared/workflow/statuses';
import type { SessionUser } from '../../auth/session-user';
import type { gradeChecks } from '../../db/schema';
import type { RequestRow } from '../../services/requests/request-access';

type Row = typeof gradeChecks.$inferSelect;

/** What the check screens need to know about the request, without the applicant's whole application. */
export function requestHeader(r: RequestRow) {
  return {
    id: r.id, reference: r.reference, status: r.status, version: r.version, applicantName: r.applicantName,
    siteAddress: r.siteAddress, roadName: r.roadName, jurisdictionId: r.jurisdictionId, application: r.application,
  };
}

/** The office gets the whole record; owners and crews get the results and summary, not who typed it. */
export function checkView(row: Row, user: SessionUser) {
  const { createdById, ...rest } = row;
  return isOfficeRole(user.role) ? { ...rest, createdById } : rest;
}
