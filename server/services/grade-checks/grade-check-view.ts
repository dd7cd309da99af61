import type { GradeCheckRequestHeader, GradeCheckView } from '@shared/contracts/grade-checks';
import { isOfficeRole } from '@shared/workflow/statuses';
import type { SessionUser } from '../../lib/session-user';
import type { GradeCheck } from './grade-checks.service';
import type { RequestRow } from '../requests/request-access';

/** What the check screens need to know about the request, without the applicant's whole application. */
export function requestHeader(r: RequestRow) {
  return {
    id: r.id,
    reference: r.reference,
    status: r.status,
    version: r.version,
    applicantName: r.applicantName,
    siteAddress: r.siteAddress,
    roadName: r.roadName,
    jurisdictionId: r.jurisdictionId,
    application: r.application as GradeCheckRequestHeader['application'],
  } satisfies GradeCheckRequestHeader;
}

/** The office gets the whole record; owners and crews get the results and summary, not who typed it. */
export function checkView(check: GradeCheck, user: SessionUser): GradeCheckView {
  const { createdById, attachedAt, createdAt, ...rest } = check;
  const view = {
    ...rest,
    attachedAt: attachedAt?.toISOString() ?? null,
    createdAt: createdAt.toISOString(),
  } satisfies GradeCheckView;
  return isOfficeRole(user.role) ? { ...view, createdById } : view;
}
