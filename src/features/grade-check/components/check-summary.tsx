import { Loading, Notice } from '@/components/ui/notice';
import { useGradeChecks } from '../api/get-grade-checks';

/** For the property owner: the latest check the office attached, in plain words. */
export function CheckSummary({ requestId }: { requestId: string }) {
  const { data, isPending, error } = useGradeChecks(requestId);
  if (isPending) return <Loading label="Loading the grade check…" />;
  if (error) return null;
  const latest = data.checks.find((c) => c.attachedAt);
  if (!latest) return <p className="text-sm text-stone-500">The office has not finished the grade check yet. It follows the site visit.</p>;
  return (
    <Notice tone={latest.passed ? 'info' : 'warn'} title={`Grade check ${latest.number}, ${new Date(latest.createdAt).toLocaleDateString()}`}>
      <p data-testid="check-summary">{latest.summary}</p>
      <p className="mt-2 text-xs">This check supports, and never replaces, the road authority’s review: its decision prevails.</p>
    </Notice>
  );
}
