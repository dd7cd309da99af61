import { useState } from 'react';
import { auditKindLabels, auditKinds, type AuditKind } from '@shared/contracts/audit';
import { formatMoment } from '@shared/format/dates';
import { Field, SelectInput } from '@/components/ui/field';
import { ErrorNotice, Loading } from '@/components/ui/notice';
import { useAudit } from '../api/get-audit';

/** Who changed what among the administrators' settings, newest first. */
export function AuditLog() {
  const [kind, setKind] = useState<AuditKind | ''>('');
  const entries = useAudit({ kind: kind || undefined });
  return (
    <div className="space-y-4">
      <div className="max-w-xs">
        <Field label="Kind of change">
          {({ id }) => (
            <SelectInput id={id} value={kind} onChange={(e) => setKind(e.target.value as AuditKind | '')}>
              <option value="">Every change</option>
              {auditKinds.map((k) => (
                <option key={k} value={k}>
                  {auditKindLabels[k]}
                </option>
              ))}
            </SelectInput>
          )}
        </Field>
      </div>
      <ErrorNotice error={entries.error} />
      {entries.isPending ? (
        <Loading />
      ) : entries.data?.entries.length === 0 ? (
        <p className="text-stone-600">No changes yet.</p>
      ) : (
        <ol className="divide-y divide-stone-100" aria-label="Changes">
          {entries.data?.entries.map((entry) => (
            <li key={entry.id} className="grid gap-1 py-2 text-sm sm:grid-cols-[12rem_10rem_1fr]">
              <time dateTime={entry.createdAt} className="text-stone-600">
                {formatMoment(entry.createdAt)}
              </time>
              <span className="font-semibold text-pine-900">{entry.actorName}</span>
              <span>
                <span className="sr-only">{auditKindLabels[entry.kind]}: </span>
                {entry.summary}
              </span>
            </li>
          ))}
        </ol>
      )}
    </div>
  );
}
