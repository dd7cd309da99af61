import { formatDay } from '@shared/format/dates';
import { Loading, Notice } from '@/components/ui/notice';
import { useGradeChecks } from '../api/get-grade-checks';

/** For the homeowner: the latest check the office attached, in plain words. */
export function CheckSummary({ requestId }: { requestId: string }) {
  const { data, isPending, error } = useGradeChecks(requestId);
  if (isPending) return <Loading label="Loading the grade check…" />;
  if (error) return null;
  const latest = data.checks.find((c) => c.attachedAt);
  if (!latest)
    return (
      <p className="text-sm text-stone-600">
        The office has not finished the grade check yet. It follows the site visit.
      </p>
    );
  const when = formatDay(latest.createdAt);
  return (
    <Notice
      tone={latest.passed ? 'info' : 'warn'}
      title={
        latest.passed
          ? `Grade check ${latest.number}, ${when}: meets the road authority’s rules`
          : `Grade check ${latest.number}, ${when}: does not meet the road authority’s rules yet`
      }
    >
      {!latest.passed && (
        <p className="mb-2 font-semibold">
          The entrance as checked is outside the rules. The office will tell you what it needs before any work goes
          ahead.
        </p>
      )}
      <p data-testid="check-summary">{latest.summary}</p>
      <p className="mt-2 text-xs">
        This check supports, and never replaces, the road authority’s review: its decision prevails.
      </p>
    </Notice>
  );
}
