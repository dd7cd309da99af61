import { useState } from 'react';
import { Link } from 'react-router';
import { statusText, type Role } from '@shared/workflow/statuses';
import { allowedTransitions, type Transition, type TransitionAction } from '@shared/workflow/transitions';
import { Button } from '@/components/ui/button';
import { ErrorNotice, Notice } from '@/components/ui/notice';
import { paths } from '@/config/paths';
import { useRunTransition } from '@/lib/status-change';
import type { OfficeRequestView as OfficeRequest } from '@shared/contracts/requests';
import { ActionForm } from './action-form';

export type Cautions = Partial<Record<TransitionAction, string>>;

/** The moves open from the current status for this person, each opening a form for what it needs. */
export function ActionPanel({
  request,
  role,
  cautions = {},
}: {
  request: OfficeRequest;
  role: Role;
  cautions?: Cautions;
}) {
  const moves = allowedTransitions(request.status, role);
  const [open, setOpen] = useState<Transition | null>(null);
  const [done, setDone] = useState('');
  const run = useRunTransition(request.id);

  if (moves.length === 0) {
    return <Notice title={request.statusLabel}>{request.whatNext} Nothing for the office to do from here.</Notice>;
  }
  return (
    <div className="space-y-3">
      {done && <Notice title="Done">{done}</Notice>}
      {open ? (
        <ActionForm
          key={open.action}
          transition={open}
          request={request}
          caution={cautions[open.action]}
          pending={run.isPending}
          error={run.error}
          onCancel={() => {
            setOpen(null);
            run.reset();
          }}
          onSubmit={(input) =>
            run.mutate(input, {
              onSuccess: () => {
                setDone(`${open.label}: the request is now “${statusText[open.to].label}”.`);
                setOpen(null);
              },
            })
          }
        />
      ) : (
        <div className="flex flex-wrap gap-2">
          {moves.map((move) => (
            <Button
              key={move.action}
              variant={move.action === 'decline' ? 'danger' : 'primary'}
              onClick={() => {
                setOpen(move);
                setDone('');
                run.reset();
              }}
            >
              {move.label}
            </Button>
          ))}
        </div>
      )}
      {open?.needs.includes('gradeCheck') && (
        <Notice tone="warn" title="Needs an attached grade check">
          Run the check and attach it on the{' '}
          <Link className="font-semibold underline" to={paths.office.gradeCheck.getHref(request.id)}>
            grade check
          </Link>{' '}
          screen first.
        </Notice>
      )}
      {run.error && <ErrorNotice error={run.error} />}
    </div>
  );
}
