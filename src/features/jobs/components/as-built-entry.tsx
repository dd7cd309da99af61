import { useMemo, useState, type FormEvent } from 'react';
import type { AsBuiltPageView, AsBuiltSetView } from '@shared/crew/crew-views';
import { formatMoment } from '@shared/format/when';
import { Button } from '@/components/ui/button';
import { Field, TextArea } from '@/components/ui/field';
import { ErrorNotice, Notice } from '@/components/ui/notice';
import { Panel } from '@/components/ui/panel';
import { ApiError } from '@/lib/api-client';
import { useSaveAsBuilt } from '../api/save-as-built';
import { outcomeOf } from '../outbox/outbox-queue';
import { addToOutbox, useOutboxItems } from '../outbox/use-outbox';
import { MarkBuiltPanel } from './mark-built-panel';
import { checkRows, checkWholeSet, type ReadingRow } from './reading-checks';
import { ReadingsTable } from './readings-table';
import { SavedSets } from './saved-sets';
import { StatusWords } from './status-words';
import { pct, station } from './format';

let nextKey = 1;
const emptyRow = (kind: ReadingRow['kind'] = 'grade'): ReadingRow => ({ key: nextKey++, station: '', kind, value: '' });
/** A saved set back in the form, reading for reading, to be corrected and saved again. */
const rowsOf = (set: AsBuiltSetView): ReadingRow[] =>
  set.readings.map((r) =>
    r.gradePercent !== undefined
      ? { key: nextKey++, station: station(r.stationFt), kind: 'grade', value: String(r.gradePercent) }
      : { key: nextKey++, station: station(r.stationFt), kind: 'elevation', value: String(r.elevationFt ?? '') },
  );

/** Readings as they are taken on site, each judged at once; the set is saved and judged again by the server. */
export function AsBuiltEntry({
  page,
  canEnter,
  userId,
}: {
  page: AsBuiltPageView;
  canEnter: boolean;
  /** The crew lead entering readings: a set that cannot be sent now waits on the phone under their name. */
  userId?: string;
}) {
  // The form opens on the latest saved set, so fixing one reading never means typing the others again.
  const latest = page.sets[0] ?? null;
  const [editing, setEditing] = useState<AsBuiltSetView | null>(latest);
  const [rows, setRows] = useState<ReadingRow[]>(() => (latest ? rowsOf(latest) : [emptyRow()]));
  const [note, setNote] = useState(latest?.note ?? '');
  // The key of the last set kept on the phone, while it is still there waiting.
  const [keptKey, setKeptKey] = useState<string>();
  const waiting = useOutboxItems(userId);
  const kept = waiting.some((i) => i.key === keptKey && i.state === 'waiting');
  const save = useSaveAsBuilt();
  const basis = useMemo(
    () => ({ ruleProfile: page.ruleProfile, design: page.design, roadEdgeStationFt: page.roadEdgeStationFt }),
    [page],
  );
  const checks = useMemo(() => checkRows(rows, basis), [rows, basis]);
  const whole = useMemo(() => checkWholeSet(checks, basis), [checks, basis]);
  const fields = save.error instanceof ApiError ? save.error.fields : {};
  const rules = page.ruleProfile;
  const open = canEnter && page.job.status === 'under_construction';

  const change = (key: number, c: Partial<ReadingRow>) =>
    setRows((list) => list.map((r) => (r.key === key ? { ...r, ...c } : r)));
  const remove = (key: number) =>
    setRows((list) => (list.length === 1 ? [emptyRow()] : list.filter((r) => r.key !== key)));
  const startEmpty = () => {
    setEditing(null);
    setRows([emptyRow()]);
    setNote('');
    save.reset();
  };
  const submit = (event: FormEvent) => {
    event.preventDefault();
    const readings = checks.flatMap((c) => (c.reading ? [c.reading] : []));
    const body = { readings, note: note || undefined, replacesSetId: editing?.id };
    // The key is made once, here: a set kept for later is sent under the same key, so it is stored once.
    const key = crypto.randomUUID();
    const keep = async () => {
      if (!userId) return;
      await addToOutbox({
        key,
        type: 'readings',
        body,
        userId,
        requestId: page.job.requestId,
        jobReference: page.job.reference,
        createdAt: new Date().toISOString(),
        state: 'waiting',
        attempts: 0,
        nextTryAt: Date.now(),
      });
      // What waits on the phone is not on the server yet: the form starts again empty.
      startEmpty();
      setKeptKey(key);
    };
    if (!navigator.onLine) {
      void keep();
      return;
    }
    save.mutate(
      { id: page.job.requestId, key, ...body },
      {
        // The set stays in the form as saved: the next save corrects it.
        onSuccess: ({ set }) => setEditing(set),
        // No answer, or the server busy: the set waits on the phone. A refusal stays on screen to be corrected.
        onError: (error) => {
          if (outcomeOf(error).kind === 'retry') void keep();
        },
      },
    );
  };

  return (
    <div className="space-y-6 text-lg">
      <Notice title={`Checked against ${page.ruleProfileLabel}`}>
        Landing (first {rules.landing.lengthFt} ft): {pct(rules.landing.minGradePercent, 1)} to{' '}
        {pct(rules.landing.maxGradePercent, 1)}; beyond it at most {pct(rules.maxGradePercent, 1)}. As-built tolerance{' '}
        {pct(rules.asBuilt.gradeTolerancePercent, 1)} on grade
        {page.design ? `, ${rules.asBuilt.elevationToleranceFt.toFixed(2)} ft off the design elevation` : ''}.
      </Notice>
      {open ? (
        <Panel title="Enter readings along the centreline">
          <form onSubmit={submit} noValidate className="space-y-4">
            {editing ? (
              <div className="flex flex-wrap items-center justify-between gap-2 text-base">
                <p>
                  Editing the set from {formatMoment(editing.createdAt)}. Change what needs changing and save: the
                  corrected set is saved as a new one and the earlier one is kept.
                </p>
                <Button variant="secondary" onClick={startEmpty} className="min-h-12 px-5 text-base">
                  Start an empty set
                </Button>
              </div>
            ) : null}
            <ReadingsTable
              rows={rows}
              checks={checks}
              basis={basis}
              serverFields={fields}
              onChange={change}
              onRemove={remove}
            />
            <div className="flex flex-wrap gap-3">
              <Button
                variant="secondary"
                onClick={() => setRows((list) => [...list, emptyRow(list[list.length - 1]?.kind)])}
                className="min-h-12 px-5 text-base"
              >
                Add a reading
              </Button>
            </div>
            {whole && (
              <p aria-live="polite" className="flex flex-wrap items-center gap-2 font-semibold">
                Whole set so far: <StatusWords status={whole.status} />
              </p>
            )}
            <Field label="Note for the office (optional)" error={fields.note}>
              {({ id, describedBy, invalid }) => (
                <TextArea
                  id={id}
                  aria-describedby={describedBy}
                  aria-invalid={invalid}
                  value={note}
                  onChange={(e) => setNote(e.target.value)}
                />
              )}
            </Field>
            {save.error && <ErrorNotice error={save.error} />}
            {save.isSuccess && (
              <Notice title="Set saved">
                The server checked it: see the latest set below. The readings stay here to correct and save again.
              </Notice>
            )}
            {kept && (
              <Notice tone="warn" title="Set kept on this phone">
                There is no connection to the server, so the set waits here (see “Waiting to send” above) and is sent by
                itself when the signal returns. The server will check it then.
              </Notice>
            )}
            <Button type="submit" disabled={save.isPending || !whole} className="min-h-12 px-6 text-base">
              {editing ? 'Save the corrected set' : 'Save this set'}
            </Button>
          </form>
        </Panel>
      ) : (
        <Notice title="Readings are closed">
          {canEnter
            ? 'Readings are entered while the job is being built; this one is not under way.'
            : 'The crew lead who has the job enters the readings.'}
        </Notice>
      )}
      <Panel title="Saved sets">
        <SavedSets sets={page.sets} basis={basis} />
      </Panel>
      {canEnter && (
        <Panel title="Finish the job">
          <MarkBuiltPanel page={page} />
        </Panel>
      )}
    </div>
  );
}
