import { useEffect, useRef, useState } from 'react';
import { useBlocker } from 'react-router';
import { Button } from '@/components/ui/button';
import { formatTime } from '@shared/format/when';
import type { DraftState } from '../lib/use-draft-autosave';

/**
 * Asks before the office leaves a survey not saved as a check. Inside the app the question says whether the typing
 * is kept as a draft (it comes back when the check is reopened); closing or reloading the tab is stopped by the
 * browser's own question only while something typed has not reached the server yet.
 */
export function LeaveSurveyGuard({
  changed,
  draft,
  settle,
}: {
  changed: boolean;
  draft: DraftState;
  settle: () => Promise<void>;
}) {
  const blocker = useBlocker(
    ({ currentLocation, nextLocation }) => changed && currentLocation.pathname !== nextLocation.pathname,
  );
  const [leaving, setLeaving] = useState(false);
  const stayRef = useRef<HTMLButtonElement>(null);
  const notOnServer = draft.kind !== 'kept';

  useEffect(() => {
    if (!notOnServer) return;
    const ask = (e: BeforeUnloadEvent) => {
      e.preventDefault();
      // Older browsers show the question only when a value is returned.
      e.returnValue = '';
    };
    window.addEventListener('beforeunload', ask);
    return () => window.removeEventListener('beforeunload', ask);
  }, [notOnServer]);

  const blocked = blocker.state === 'blocked';
  const stay = blocker.reset;
  useEffect(() => {
    if (!blocked) return;
    stayRef.current?.focus();
    // Escape answers "stay", as closing any question does.
    const onKey = (e: KeyboardEvent) => {
      if (e.key === 'Escape') stay?.();
    };
    document.addEventListener('keydown', onKey);
    return () => document.removeEventListener('keydown', onKey);
  }, [blocked, stay]);
  if (!blocked) return null;

  const leave = async () => {
    setLeaving(true);
    await settle();
    blocker.proceed?.();
  };
  return (
    <div className="fixed inset-0 z-50 flex items-center justify-center bg-stone-900/40 p-4">
      <div
        role="alertdialog"
        aria-modal="true"
        aria-labelledby="leave-survey-title"
        aria-describedby="leave-survey-words"
        className="w-full max-w-md rounded-lg border border-stone-200 bg-white p-5 shadow-xl"
      >
        <h2 id="leave-survey-title" className="text-lg font-semibold">
          This survey is not saved as a check
        </h2>
        <div id="leave-survey-words" className="mt-2 space-y-2 text-sm text-stone-700">
          {draft.kind === 'failed' ? (
            <p className="font-semibold text-red-900">
              It could not be kept as a draft either ({draft.error instanceof Error ? draft.error.message : 'no answer'}
              ). If you leave now, what you typed is lost.
            </p>
          ) : (
            <p>
              What you typed is kept as your draft
              {draft.kind === 'kept' && draft.at ? ` (kept at ${formatTime(draft.at)})` : ''} and comes back when you
              open this grade check again. Nobody else sees it.
            </p>
          )}
        </div>
        <div className="mt-4 flex flex-wrap gap-2">
          <Button ref={stayRef} onClick={() => stay?.()}>
            Stay on the survey
          </Button>
          <Button variant={draft.kind === 'failed' ? 'danger' : 'secondary'} disabled={leaving} onClick={leave}>
            {draft.kind === 'failed' ? 'Leave and lose it' : leaving ? 'Keeping the draft…' : 'Leave; keep the draft'}
          </Button>
        </div>
      </div>
    </div>
  );
}
