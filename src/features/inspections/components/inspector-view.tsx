import type { ReactNode } from 'react';
import { formatStation } from '@shared/engine';
import type { InspectorPageView } from '@shared/contracts/inspections';
import { formatDay } from '@shared/format/dates';
import { Notice } from '@/components/ui/notice';
import { Panel } from '@/components/ui/panel';
import { InspectionList } from './inspection-list';
import { OutcomeForm } from './outcome-form';

const verdictWords = { pass: 'Pass', advisory: 'Within tolerance', fail: 'Fail' } as const;
const verdictTone = { pass: 'text-pine-800', advisory: 'text-amber-800', fail: 'text-clay' } as const;
const station = (ft: number) => formatStation(ft);

function Facts({ rows }: { rows: [string, ReactNode][] }) {
  return (
    <dl className="grid grid-cols-1 gap-x-4 gap-y-1 text-sm sm:grid-cols-[12rem_1fr]">
      {rows.map(([label, value]) => (
        <div key={label} className="contents">
          <dt className="font-semibold text-stone-700">{label}</dt>
          <dd className="mb-2 min-w-0 break-words text-stone-900 sm:mb-0">{value}</dd>
        </div>
      ))}
    </dl>
  );
}

/**
 * The road authority inspector's read-only page for one built entrance, reached by a link with no account: the
 * permit, the documents, the as-built readings against the approved profile, the crew's photos and note, and the
 * form to record the outcome. `photos` is the crew's photo grid, drawn by the photos feature.
 */
export function InspectorView({ page, token, photos }: { page: InspectorPageView; token: string; photos: ReactNode }) {
  const { request, permit } = page;
  return (
    <div className="space-y-5">
      <header>
        <p className="text-sm font-semibold uppercase tracking-wide text-stone-600">Entrance inspection</p>
        <h1 className="break-words text-2xl font-bold text-pine-900">{request.siteAddress}</h1>
        <p className="text-stone-600">
          {request.roadName ? `On ${request.roadName} · ` : ''}Our reference {request.reference} · {request.statusLabel}
          {request.builtAt ? ` · built ${formatDay(request.builtAt)}` : ''}
        </p>
      </header>

      <Panel title="Permit">
        <Facts
          rows={[
            ['Road authority', page.authority ? `${page.authority.authority} (${page.authority.name})` : '—'],
            ['Permit number', permit.reference ?? '—'],
            ['Granted on', formatDay(permit.decidedOn)],
            ['Expires on', formatDay(permit.expiresOn)],
            [
              'Conditions',
              permit.conditions ? <span className="whitespace-pre-line">{permit.conditions}</span> : 'None recorded',
            ],
          ]}
        />
        {page.documents.length > 0 && (
          <ul className="mt-3 space-y-1 text-sm">
            {page.documents.map((d) => (
              <li key={d.url}>
                <a href={d.url} target="_blank" rel="noreferrer" className="font-semibold text-pine-800 underline">
                  {d.title} (PDF)
                </a>
              </li>
            ))}
          </ul>
        )}
        {page.gradeCheck && (
          <p className="mt-3 text-sm text-stone-700">
            Grade check {page.gradeCheck.number} against {page.gradeCheck.ruleProfileLabel}: {page.gradeCheck.summary}
          </p>
        )}
      </Panel>

      <Panel title="Finished grades against the approved profile">
        {page.asBuilt ? (
          <>
            <p className={`mb-2 text-sm font-semibold ${verdictTone[page.asBuilt.status]}`}>
              Overall: {verdictWords[page.asBuilt.status]} · readings taken {formatDay(page.asBuilt.takenAt)}
            </p>
            <div className="overflow-x-auto">
              <table className="w-full min-w-0 text-left text-sm">
                <thead>
                  <tr className="border-b border-stone-200 text-stone-600">
                    <th className="py-1 pr-2 font-semibold">Station</th>
                    <th className="py-1 pr-2 font-semibold">Measured</th>
                    <th className="py-1 pr-2 font-semibold">Limit</th>
                    <th className="py-1 font-semibold">Result</th>
                  </tr>
                </thead>
                <tbody>
                  {page.asBuilt.readings.map((r, i) => (
                    <tr key={i} className="border-b border-stone-100">
                      <td className="py-1 pr-2 font-mono">{station(r.stationFt)}</td>
                      <td className="py-1 pr-2">
                        {r.measured.toFixed(2)} {r.unit}
                      </td>
                      <td className="py-1 pr-2">
                        {r.limit.toFixed(2)} {r.unit}
                      </td>
                      <td className={`py-1 font-semibold ${verdictTone[r.status]}`}>{verdictWords[r.status]}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </div>
          </>
        ) : (
          <p className="text-sm text-stone-600">No finished-grade readings were recorded.</p>
        )}
      </Panel>

      <Panel title="Crew’s photos">{photos}</Panel>

      <Panel title="Crew’s note">
        {page.crewNote ? (
          <p className="whitespace-pre-line break-words text-sm text-stone-800">{page.crewNote}</p>
        ) : (
          <p className="text-sm text-stone-600">The crew left no note.</p>
        )}
      </Panel>

      <Panel title="Inspection">
        <div className="space-y-4">
          <InspectionList inspections={page.inspections} />
          {page.link.canRecord ? (
            <OutcomeForm page={page} token={token} />
          ) : (
            page.link.whyNot && <Notice>{page.link.whyNot}</Notice>
          )}
        </div>
      </Panel>

      <div className="space-y-1 text-xs text-stone-600">
        {page.cautions.map((c) => (
          <p key={c}>{c}</p>
        ))}
        <p>
          This link opens this entrance only and works until {formatDay(page.link.expiresAt)}. Questions:{' '}
          <a className="underline" href={`mailto:${page.officeEmail}`}>
            {page.officeEmail}
          </a>
          .
        </p>
      </div>
    </div>
  );
}
