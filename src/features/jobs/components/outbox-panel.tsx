import { useEffect, useState } from 'react';
import { crewPhotoKindLabels } from '@shared/contracts/crew-photos';
import { Button } from '@/components/ui/button';
import { formatMoment } from '@shared/format/when';
import { summarize, type OutboxItem } from '../outbox/outbox-queue';
import { useOutboxActions, useOutboxItems, useOutboxSender } from '../outbox/use-outbox';

function useOnline() {
  const [online, setOnline] = useState(() => navigator.onLine);
  useEffect(() => {
    const on = () => setOnline(true);
    const off = () => setOnline(false);
    window.addEventListener('online', on);
    window.addEventListener('offline', off);
    return () => {
      window.removeEventListener('online', on);
      window.removeEventListener('offline', off);
    };
  }, []);
  return online;
}

function ItemWords({ item }: { item: OutboxItem }) {
  if (item.type === 'photo') {
    return (
      <>
        Photo ({crewPhotoKindLabels[item.photo.kind].toLowerCase()})
        {item.photo.caption ? `: ${item.photo.caption}` : ''}
      </>
    );
  }
  const shots = item.body.readings
    .map((r) =>
      r.gradePercent !== undefined
        ? `${r.stationFt} ft: ${r.gradePercent}%`
        : `${r.stationFt} ft: elev. ${r.elevationFt}`,
    )
    .join('; ');
  return (
    <>
      {item.body.readings.length} {item.body.readings.length === 1 ? 'reading' : 'readings'} ({shots})
      {item.body.note ? `. Note: ${item.body.note}` : ''}
    </>
  );
}

/** A refused item stays on the phone until the crew lead sends it again or lets it go, with a second tap. */
function HeldItem({ item }: { item: OutboxItem }) {
  const { retry, discard } = useOutboxActions();
  const [confirming, setConfirming] = useState(false);
  return (
    <li className="rounded-md border border-clay/40 bg-white p-3">
      <p className="font-semibold">
        {item.jobReference} · entered {formatMoment(item.createdAt)}
      </p>
      <p>
        <ItemWords item={item} />
      </p>
      <p className="mt-1 text-red-900">The server did not take it: {item.problem}</p>
      <div className="mt-2 flex flex-wrap gap-2">
        <Button variant="secondary" onClick={() => void retry(item)}>
          Send it again
        </Button>
        {confirming ? (
          <>
            <Button variant="danger" onClick={() => void discard(item)}>
              Yes, delete it from this phone
            </Button>
            <Button variant="quiet" onClick={() => setConfirming(false)}>
              Keep it
            </Button>
          </>
        ) : (
          <Button variant="quiet" onClick={() => setConfirming(true)}>
            Delete it…
          </Button>
        )}
      </div>
    </li>
  );
}

/**
 * What the crew lead entered on this phone and the server has not stored yet, on every crew screen: the count
 * waiting for a connection, and each refused item with what the server said and the choice of what to do.
 */
export function OutboxPanel({ userId }: { userId: string }) {
  useOutboxSender(userId);
  const items = useOutboxItems(userId);
  const online = useOnline();
  const { waiting, held } = summarize(items);
  const heldItems = items.filter((i) => i.state === 'held');
  if (!waiting && !held && online) return null;
  return (
    <section aria-label="Sending from this phone" className="no-print mb-4 space-y-2 text-sm">
      {!online && (
        <p role="status" className="rounded-md border border-stone-300 bg-stone-100 px-4 py-2 text-stone-800">
          No connection. The field sheet and the readings work from this phone; what you enter is kept here and sent
          when the signal returns.
        </p>
      )}
      {waiting && (
        <p role="status" className="rounded-md border border-tape bg-amber-50 px-4 py-2 font-semibold text-amber-950">
          Waiting to send: {waiting}
          {online && items.some((i) => i.state === 'waiting' && i.problem) && (
            <span className="block font-normal">{items.find((i) => i.state === 'waiting' && i.problem)?.problem}</span>
          )}
        </p>
      )}
      {held && (
        <div role="alert" className="rounded-md border border-clay/40 bg-red-50 px-4 py-3 text-red-900">
          <p className="font-semibold">Not sent, kept on this phone: {held}</p>
          <ul className="mt-2 space-y-2 text-stone-900">
            {heldItems.map((item) => (
              <HeldItem key={item.key} item={item} />
            ))}
          </ul>
        </div>
      )}
    </section>
  );
}
