import { formatMoment } from '@shared/format/dates';
import { useState } from 'react';
import { gradeCheckOpenStatuses } from '@shared/workflow/statuses';
import { Button } from '@/components/ui/button';
import { ErrorNotice, Notice } from '@/components/ui/notice';
import { useAttachGradeCheck } from '../api/attach-grade-check';
import type { GradeCheckRequestHeader, GradeCheckView } from '@shared/contracts/grade-checks';
import { useMarkChecked } from '../api/mark-checked';
import { useWithdrawGradeCheck } from '../api/withdraw-grade-check';

/** Saved checks, newest first: attach one as the request's report (a failing one only after a yes), then mark the request checked. */
export function SavedChecks({ request, checks }: { request: GradeCheckRequestHeader; checks: GradeCheckView[] }) {
  const attach = useAttachGradeCheck(request.id);
  const withdraw = useWithdrawGradeCheck(request.id);
  const markChecked = useMarkChecked();
  const [share, setShare] = useState(true);
  const [confirming, setConfirming] = useState<GradeCheckView | null>(null);
  const hasAttached = checks.some((c) => c.attachedAt);
  const withdrawable = gradeCheckOpenStatuses.includes(request.status);
  if (checks.length === 0)
    return <p className="text-sm text-stone-600">No saved checks yet. Save the survey to make check 1.</p>;
  const attachNow = (c: GradeCheckView, confirmFailing: boolean) =>
    attach.mutate(
      { checkId: c.id, shareWithApplicant: share, confirmFailing },
      { onSuccess: () => setConfirming(null) },
    );
  return (
    <div className="space-y-3">
      <label className="flex items-center gap-2 text-sm">
        <input type="checkbox" checked={share} onChange={(e) => setShare(e.target.checked)} />
        Share the report with the homeowner when attaching
      </label>
      <ul className="divide-y divide-stone-100" aria-label="Saved checks">
        {checks.map((c) => (
          <li key={c.id} className="flex flex-wrap items-start justify-between gap-3 py-2">
            <div className="max-w-2xl">
              <p className="font-semibold">
                Check {c.number} · {c.passed ? 'meets the rules' : 'does not meet the rules'} ·{' '}
                {formatMoment(c.createdAt)}
              </p>
              <p className="text-sm text-stone-600">{c.summary}</p>
            </div>
            {c.attachedAt ? (
              <div className="flex flex-wrap items-center gap-2">
                <span className="rounded-full border border-pine-200 bg-pine-50 px-2 text-xs font-semibold text-pine-800">
                  Attached
                </span>
                {withdrawable && (
                  <Button variant="secondary" disabled={withdraw.isPending} onClick={() => withdraw.mutate(c.id)}>
                    Withdraw check {c.number}
                  </Button>
                )}
              </div>
            ) : (
              <Button
                variant="secondary"
                disabled={attach.isPending}
                onClick={() => (c.passed ? attachNow(c, false) : setConfirming(c))}
              >
                {attach.isPending ? 'Making the report…' : `Attach check ${c.number}`}
              </Button>
            )}
          </li>
        ))}
      </ul>
      {confirming && (
        <Notice tone="warn" title={`Check ${confirming.number} does not meet the rules`}>
          <p>
            Attached, it goes on the request as the office’s finding
            {share ? ', and the homeowner reads it with its report' : ''}. Attach it only if that is what you mean to
            tell them.
          </p>
          <div className="mt-2 flex flex-wrap gap-2">
            <Button variant="danger" disabled={attach.isPending} onClick={() => attachNow(confirming, true)}>
              Attach it anyway
            </Button>
            <Button variant="secondary" onClick={() => setConfirming(null)}>
              Keep it unattached
            </Button>
          </div>
        </Notice>
      )}
      <ErrorNotice error={attach.error} />
      <ErrorNotice error={withdraw.error} />
      {request.status === 'visit_booked' && (
        <div className="flex flex-wrap items-center gap-3">
          <Button
            disabled={!hasAttached || markChecked.isPending}
            onClick={() => markChecked.mutate({ requestId: request.id, expectedVersion: request.version })}
          >
            Mark grade check done
          </Button>
          {!hasAttached && <span className="text-sm text-stone-600">Attach a check first.</span>}
        </div>
      )}
      {request.status === 'checked' && (
        <Notice title="Grade check done">The homeowner has been told the result.</Notice>
      )}
      <ErrorNotice error={markChecked.error} />
    </div>
  );
}
