import type { ReactNode } from 'react';
import { ErrorNotice, Loading } from '@/components/ui/notice';
import { PlanView } from '@/components/ui/plan-view';
import { ProfileChart } from '@/components/ui/profile-chart';
import { useFieldSheet } from '../api/get-field-sheet';
import { EarthworkLine } from './earthwork-line';
import { cutFillWords, day, ft, pct, station } from './format';
import { SheetCulvert } from './sheet-culvert';
import { SheetLaser } from './sheet-laser';
import { SheetWarp } from './sheet-warp';

// One sheet of paper, Letter or A4 (whichever the printer holds: no size is forced), with narrow margins; the
// sheet's own type sizes take over from the screen's large ones. tests/e2e/field-sheet-print.test.ts counts pages.
const pageCss = '@page { margin: 0.25in; }';

function Section({ title, children, className = '' }: { title: string; children: ReactNode; className?: string }) {
  return (
    <section className={`break-inside-avoid border-t-4 border-stone-900 pt-2 print:pt-0.5 ${className}`}>
      <h2 className="mb-1 text-xl font-bold print:mb-0 print:text-[10pt]">{title}</h2>
      {children}
    </section>
  );
}

/** What the crew takes to site. Large, black-on-white type for a phone in sunlight; one page when printed. */
export function FieldSheet({ id }: { id: string }) {
  const sheet = useFieldSheet(id);
  if (sheet.isPending) return <Loading label="Loading the field sheet…" />;
  if (sheet.error) return <ErrorNotice error={sheet.error} />;
  const s = sheet.data;
  return (
    <article className="space-y-4 bg-white p-3 text-lg leading-snug text-black print:space-y-1 print:p-0 print:text-[8pt] print:leading-tight">
      <style>{pageCss}</style>
      <header className="flex flex-wrap items-start justify-between gap-3">
        <div>
          <h1 className="text-3xl font-bold print:text-[14pt]">Field sheet · {s.job.reference}</h1>
          <p className="text-xl font-semibold print:text-[10pt]">
            {s.job.siteAddress} · {s.job.roadName}
          </p>
          <p>
            Homeowner {s.job.applicantName} · crew {s.job.crewName ?? 'not taken yet'} · work day{' '}
            {day(s.job.scheduledFor)}
          </p>
        </div>
        <button
          type="button"
          onClick={() => window.print()}
          className="no-print min-h-12 rounded-md bg-pine-800 px-5 font-semibold text-white"
        >
          Print this sheet
        </button>
      </header>

      {/* On paper the plan sits beside the cautions and the check's words, so the sheet stays one page. */}
      <div
        className={`space-y-4 ${s.plan ? 'print:grid print:grid-cols-[5fr_2fr] print:items-start print:gap-3 print:space-y-0' : ''}`}
      >
        <div className="space-y-4 print:space-y-1">
          <section aria-label="Cautions" className="rounded border-4 border-tape p-3 print:border-2 print:p-1">
            <h2 className="text-xl font-bold print:text-[10pt]">Before and while you dig</h2>
            <ul className="list-disc space-y-1 pl-6 print:columns-2 print:gap-x-6 print:space-y-0">
              {s.cautions.map((c) => (
                <li key={c}>{c}</li>
              ))}
            </ul>
          </section>
          <Section title="Grade check">
            {s.check ? (
              <p>
                Check {s.check.number} against {s.check.ruleProfileLabel}: {s.check.summary}
              </p>
            ) : (
              <p>No saved grade check.</p>
            )}
            {s.rules && (
              <p>
                Landing {station(0)} to {station(s.rules.landingLengthFt)}: {pct(s.rules.landingMinPercent, 1)} to{' '}
                {pct(s.rules.landingMaxPercent, 1)}. Beyond it at most {pct(s.rules.maxGradePercent, 1)}.
              </p>
            )}
          </Section>
        </div>
        {s.plan && (
          <Section title="Plan of the entrance">
            <PlanView plan={s.plan} className="print:hidden" />
            {/* On paper a third of the width: drawn on a smaller sheet, so its words stay large enough to read. */}
            <PlanView plan={{ ...s.plan, width: 420, height: 300 }} className="hidden print:block" />
          </Section>
        )}
      </div>

      <div className="grid gap-4 md:grid-cols-2 lg:grid-cols-3 print:grid-cols-3 print:gap-2">
        <Section title="Site and access">
          <p>
            {s.access.whereText || 'No landmark given.'}
            {s.access.parcelNumber ? ` · parcel ${s.access.parcelNumber}` : ''}
          </p>
          <p>
            Road owner: {s.access.roadOwner || 'not given'}
            {s.access.postedSpeedMph ? ` · posted ${s.access.postedSpeedMph} mph` : ''}
          </p>
          {s.access.notes && (
            <p>
              <strong>Notes:</strong> {s.access.notes}
            </p>
          )}
        </Section>
        <Section title="Permit">
          <p>
            <strong>{s.permit.reference ?? 'No reference recorded'}</strong>
            {s.permit.authority ? ` · ${s.permit.authority}` : ''}
          </p>
          <p>Expires {day(s.permit.expiresOn)}</p>
          {s.permit.conditions && (
            <p>
              <strong>Conditions:</strong> {s.permit.conditions}
            </p>
          )}
        </Section>
        <Section title="Culvert">
          <SheetCulvert culvert={s.culvert} />
        </Section>
      </div>

      <Section title="Laser">
        {s.laser ? <SheetLaser laser={s.laser} /> : <p>No laser setup in the saved check.</p>}
      </Section>

      {s.apron && (
        <Section title="Warp stakes at the entrance edges">
          <SheetWarp apron={s.apron} />
        </Section>
      )}

      <Section title="Design profile">
        {/* On paper the chart sits beside the cut and fill, whose rows run in two columns. */}
        <div className="grid gap-4 lg:grid-cols-[2fr_3fr] print:grid-cols-[1fr_2fr] print:gap-3">
          {s.design ? (
            <ProfileChart chart={s.design.chart} className="print:[&>svg]:h-auto print:[&>svg]:w-full" />
          ) : (
            <p>No profile in the saved check.</p>
          )}
          {s.design && s.design.cutFill.length > 0 && (
            <div className="print:columns-2 print:gap-x-3 print:whitespace-nowrap print:text-[7pt] print:leading-none">
              <table className="stack-table mt-1 w-full border-collapse text-left">
                <caption className="text-left font-bold">Cut and fill on the centreline</caption>
                <thead>
                  <tr className="border-b-2 border-stone-800">
                    <th className="pr-2">Station</th>
                    <th className="pr-2">Ground</th>
                    <th className="pr-2">Design</th>
                    <th>Cut / fill</th>
                  </tr>
                </thead>
                <tbody>
                  {s.design.cutFill.map((c) => (
                    <tr key={c.stationFt} className="border-b border-stone-400">
                      <td data-label="Station" className="pr-2">
                        {station(c.stationFt)}
                      </td>
                      <td data-label="Ground" className="pr-2">
                        {ft(c.existingFt)}
                      </td>
                      <td data-label="Design" className="pr-2">
                        {ft(c.designFt)}
                      </td>
                      <td data-label="Cut / fill" className="font-bold">
                        {cutFillWords(c.cutFillFt)}
                      </td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </div>
          )}
        </div>
        <EarthworkLine earthwork={s.earthwork} />
      </Section>
    </article>
  );
}
