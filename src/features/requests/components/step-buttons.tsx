import { Button } from '@/components/ui/button';

/** Back and next for one step; next is the form's submit, so Enter in any field moves on. */
export function StepButtons({
  saving,
  onBack,
  nextLabel = 'Save and continue',
}: {
  saving: boolean;
  onBack?: () => void;
  nextLabel?: string;
}) {
  return (
    <div className="flex flex-wrap items-center gap-3 border-t border-stone-200 pt-4">
      {onBack && (
        <Button variant="secondary" onClick={onBack} disabled={saving}>
          Back
        </Button>
      )}
      <Button type="submit" disabled={saving}>
        {saving ? 'Saving…' : nextLabel}
      </Button>
    </div>
  );
}
