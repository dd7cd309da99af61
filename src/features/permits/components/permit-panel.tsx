import { useState } from 'react';
import { formatDay } from '@shared/format/dates';
import type { RequestStatus } from '@shared/workflow/statuses';
import { ErrorNotice } from '@/components/ui/notice';
import { permitPacketHref, usePermitDocuments } from '../api/get-permit-documents';
import { useUploadDecisionLetter } from '../api/upload-decision-letter';

const packetStatuses: readonly RequestStatus[] = ['checked', 'permit_filed', 'permit_granted', 'permit_refused'];
const kindWords: Record<string, string> = { 'permit-packet': 'Packet filed', 'decision-letter': 'Authority’s letter' };

/**
 * The permit packet the office sends with the application (read it before filing, at Letter or A4), the packets
 * filed, and the road authority's decision letter, added as a PDF or a photo of it.
 */
export function PermitPanel({
  requestId,
  status,
  filed,
}: {
  requestId: string;
  status: RequestStatus;
  filed: boolean;
}) {
  const [paper, setPaper] = useState<'letter' | 'a4'>('letter');
  const documents = usePermitDocuments(requestId);
  const upload = useUploadDecisionLetter(requestId);
  const permitDocs = (documents.data?.documents ?? []).filter((d) => d.kind in kindWords);
  return (
    <div className="space-y-3 text-sm">
      {packetStatuses.includes(status) && (
        <div className="space-y-2">
          <label className="flex items-center gap-2">
            Paper
            <select
              aria-label="Packet paper size"
              value={paper}
              onChange={(e) => setPaper(e.target.value as 'letter' | 'a4')}
              className="rounded border border-stone-300 px-2 py-1"
            >
              <option value="letter">Letter</option>
              <option value="a4">A4</option>
            </select>
          </label>
          <a
            className="font-semibold text-pine-700 underline"
            href={permitPacketHref(requestId, paper)}
            target="_blank"
            rel="noreferrer"
          >
            Read the permit packet (PDF)
          </a>
          <p className="text-stone-600">Recording the permit filed stores the packet sent with it.</p>
        </div>
      )}
      {permitDocs.length > 0 && (
        <ul aria-label="Permit documents" className="divide-y divide-stone-100">
          {permitDocs.map((d) => (
            <li key={d.id} className="py-1">
              <a className="font-semibold text-pine-700 underline" href={d.url} target="_blank" rel="noreferrer">
                {d.title}
              </a>
              <span className="block text-xs text-stone-600">
                {kindWords[d.kind]} · {formatDay(d.createdAt)} · {Math.max(1, Math.round(d.sizeBytes / 1024))} KB
              </span>
            </li>
          ))}
        </ul>
      )}
      {filed && (
        <label className="block">
          <span className="font-semibold">Add the road authority’s letter</span>
          <span className="block text-xs text-stone-600">A PDF, or a photo of the paper letter.</span>
          <input
            type="file"
            accept="application/pdf,image/jpeg,image/png,image/webp,image/heic"
            disabled={upload.isPending}
            className="mt-1 block w-full"
            onChange={(e) => {
              const file = e.target.files?.[0];
              if (file) upload.mutate(file, { onSettled: () => (e.target.value = '') });
            }}
          />
        </label>
      )}
      {upload.isPending && <p role="status">Sending the letter…</p>}
      {upload.isSuccess && <p role="status">Letter added.</p>}
      <ErrorNotice error={upload.error} />
    </div>
  );
}
