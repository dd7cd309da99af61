import { useState, type FormEvent } from 'react';
import {
  baseCourseBases,
  lineKindLabels,
  pipeMaterialLabels,
  pipeMaterials,
  quoteLineKinds,
  rateCardLabels as L,
  type PricedLineKind,
  type PipeMaterial,
  type RateCardPrices,
  type RateCardView,
} from '@shared/contracts/rate-cards';
import {
  centsToDollarsText,
  formatBasisPoints,
  parseDollarsToCents,
  parsePercentToBasisPoints,
} from '@shared/money/money';
import { Button } from '@/components/ui/button';
import { Field, SelectInput, TextInput } from '@/components/ui/field';
import { ErrorNotice, Notice } from '@/components/ui/notice';
import { ApiError } from '@/lib/api-client';
import { usePublishRateCard } from '../api/publish-rate-card';
import { useUpdateRateCard } from '../api/update-rate-card';

const moneyKeys = [
  'excavationPerBankCyCents',
  'fillPerCompactedCyCents',
  'haulPerLoadCents',
  'mobilisationCents',
  'trafficControlPerDayCents',
  'permitFeeCents',
] as const;
type MoneyKey = (typeof moneyKeys)[number];
const pricedKinds = quoteLineKinds.filter((k): k is PricedLineKind => k !== 'other');

interface PipeRow {
  diameterIn: string;
  material: PipeMaterial;
  perFoot: string;
  endSection: string;
}
interface FormState {
  money: Record<MoneyKey, string>;
  baseBasis: RateCardPrices['baseCourse']['basis'];
  basePrice: string;
  baseDepthIn: string;
  baseTonsPerCy: string;
  paving: string;
  trafficControlDays: string;
  salesTax: string;
  deposit: string;
  taxable: Record<PricedLineKind, boolean>;
  pipes: PipeRow[];
  changeNote: string;
}

function toForm(card: RateCardView): FormState {
  const p = card.prices;
  return {
    money: Object.fromEntries(moneyKeys.map((k) => [k, centsToDollarsText(p[k])])) as Record<MoneyKey, string>,
    baseBasis: p.baseCourse.basis,
    basePrice: centsToDollarsText(p.baseCourse.priceCents),
    baseDepthIn: String(p.baseCourse.depthIn),
    baseTonsPerCy: String(p.baseCourse.tonsPerCy),
    paving: p.pavingPerSqFtCents === null ? '' : centsToDollarsText(p.pavingPerSqFtCents),
    trafficControlDays: String(p.trafficControlDays),
    salesTax: formatBasisPoints(p.salesTaxBp).replace('%', ''),
    deposit: formatBasisPoints(p.depositBp).replace('%', ''),
    taxable: { ...p.taxable },
    pipes: p.pipes.map((pipe) => ({
      diameterIn: String(pipe.diameterIn),
      material: pipe.material,
      perFoot: centsToDollarsText(pipe.perFootCents),
      endSection: centsToDollarsText(pipe.endSectionEachCents),
    })),
    changeNote: card.changeNote,
  };
}

const moneyWords = (label: string) => `${label} must be dollars and cents, zero or more (like 18.50)`;
const numberOf = (text: string) => (/^\s*-?\d+(\.\d+)?\s*$/.test(text) ? Number(text) : Number.NaN);

/** The form's text as the contract's prices; a box that is not money says so by its label before anything is sent. */
function toPrices(form: FormState): { prices?: RateCardPrices; errors: Record<string, string> } {
  const errors: Record<string, string> = {};
  const cents = (text: string, key: string, label: string) => {
    const value = parseDollarsToCents(text);
    if (value === null) errors[key] = moneyWords(label);
    return value ?? 0;
  };
  const percent = (text: string, key: string, label: string) => {
    const value = parsePercentToBasisPoints(text);
    if (value === null) errors[key] = `${label} must be a percentage with at most two decimals (like 6.25)`;
    return value ?? 0;
  };
  const money = Object.fromEntries(moneyKeys.map((k) => [k, cents(form.money[k], `prices.${k}`, L[k])])) as Record<
    MoneyKey,
    number
  >;
  const prices: RateCardPrices = {
    ...money,
    pipes: form.pipes.map((pipe, i) => ({
      diameterIn: numberOf(pipe.diameterIn),
      material: pipe.material,
      perFootCents: cents(pipe.perFoot, `prices.pipes.${i}.perFootCents`, L.perFootCents),
      endSectionEachCents: cents(pipe.endSection, `prices.pipes.${i}.endSectionEachCents`, L.endSectionEachCents),
    })),
    baseCourse: {
      basis: form.baseBasis,
      priceCents: cents(form.basePrice, 'prices.baseCourse.priceCents', L.baseCoursePriceCents),
      depthIn: numberOf(form.baseDepthIn),
      tonsPerCy: numberOf(form.baseTonsPerCy),
    },
    pavingPerSqFtCents:
      form.paving.trim() === '' ? null : cents(form.paving, 'prices.pavingPerSqFtCents', L.pavingPerSqFtCents),
    trafficControlDays: numberOf(form.trafficControlDays),
    salesTaxBp: percent(form.salesTax, 'prices.salesTaxBp', L.salesTaxBp),
    depositBp: percent(form.deposit, 'prices.depositBp', L.depositBp),
    taxable: form.taxable,
  };
  return Object.keys(errors).length > 0 ? { errors } : { prices, errors };
}

/** A draft rate card's prices, saved as a draft or published after a confirmation. */
export function RateCardForm({ card }: { card: RateCardView }) {
  const [form, setForm] = useState(() => toForm(card));
  const [localErrors, setLocalErrors] = useState<Record<string, string>>({});
  const [confirming, setConfirming] = useState(false);
  const [dirty, setDirty] = useState(false);
  const update = useUpdateRateCard();
  const publish = usePublishRateCard();
  const serverErrors = update.error instanceof ApiError ? update.error.fields : {};
  const err = (key: string) => localErrors[key] ?? serverErrors[key];
  const change = (patch: Partial<FormState>) => {
    setForm((f) => ({ ...f, ...patch }));
    setDirty(true);
    setConfirming(false);
  };

  const save = async () => {
    const { prices, errors } = toPrices(form);
    setLocalErrors(errors);
    if (!prices) return false;
    await update.mutateAsync({ id: card.id, input: { prices, changeNote: form.changeNote } });
    setDirty(false);
    return true;
  };
  const onSubmit = (e: FormEvent) => {
    e.preventDefault();
    void save().catch(() => undefined);
  };
  const moneyBox = (key: MoneyKey, hint?: string) => (
    <Field key={key} label={`${L[key]} ($)`} hint={hint} error={err(`prices.${key}`)}>
      {(ids) => (
        <TextInput
          id={ids.id}
          aria-describedby={ids.describedBy}
          aria-invalid={ids.invalid}
          inputMode="decimal"
          value={form.money[key]}
          onChange={(e) => change({ money: { ...form.money, [key]: e.target.value } })}
        />
      )}
    </Field>
  );
  const textBox = (label: string, key: string, value: string, set: (v: string) => void, hint?: string) => (
    <Field label={label} hint={hint} error={err(key)}>
      {(ids) => (
        <TextInput
          id={ids.id}
          aria-describedby={ids.describedBy}
          aria-invalid={ids.invalid}
          inputMode="decimal"
          value={value}
          onChange={(e) => set(e.target.value)}
        />
      )}
    </Field>
  );
  const errorCount = Object.keys(localErrors).length + Object.keys(serverErrors).length;

  return (
    <form className="space-y-6" onSubmit={onSubmit} noValidate>
      <fieldset className="grid gap-4 sm:grid-cols-2">
        <legend className="mb-2 font-bold text-pine-900">Earthwork and haul</legend>
        {moneyBox('excavationPerBankCyCents', 'Cut measured in place, before it swells.')}
        {moneyBox('fillPerCompactedCyCents', 'Fill brought in, placed and compacted.')}
        {moneyBox('haulPerLoadCents')}
      </fieldset>

      <fieldset className="space-y-3">
        <legend className="mb-2 font-bold text-pine-900">{L.pipes}</legend>
        {form.pipes.length === 0 && <p className="text-sm text-stone-600">No pipe sizes priced yet.</p>}
        {form.pipes.map((pipe, i) => {
          const set = (patch: Partial<PipeRow>) =>
            change({ pipes: form.pipes.map((p, j) => (j === i ? { ...p, ...patch } : p)) });
          return (
            <div key={i} className="grid items-end gap-3 rounded border border-stone-200 p-3 sm:grid-cols-5">
              {textBox(L.diameterIn, `prices.pipes.${i}.diameterIn`, pipe.diameterIn, (v) => set({ diameterIn: v }))}
              <Field label={L.material} error={err(`prices.pipes.${i}.material`)}>
                {(ids) => (
                  <SelectInput
                    id={ids.id}
                    aria-describedby={ids.describedBy}
                    value={pipe.material}
                    onChange={(e) => set({ material: e.target.value as PipeMaterial })}
                  >
                    {pipeMaterials.map((m) => (
                      <option key={m} value={m}>
                        {pipeMaterialLabels[m]}
                      </option>
                    ))}
                  </SelectInput>
                )}
              </Field>
              {textBox(`${L.perFootCents} ($)`, `prices.pipes.${i}.perFootCents`, pipe.perFoot, (v) =>
                set({ perFoot: v }),
              )}
              {textBox(`${L.endSectionEachCents} ($)`, `prices.pipes.${i}.endSectionEachCents`, pipe.endSection, (v) =>
                set({ endSection: v }),
              )}
              <Button variant="quiet" onClick={() => change({ pipes: form.pipes.filter((_, j) => j !== i) })}>
                Remove this size
              </Button>
            </div>
          );
        })}
        <Button
          variant="secondary"
          onClick={() =>
            change({
              pipes: [
                ...form.pipes,
                { diameterIn: '18', material: 'corrugated-metal', perFoot: '0.00', endSection: '0.00' },
              ],
            })
          }
        >
          Add a pipe size
        </Button>
      </fieldset>

      <fieldset className="grid gap-4 sm:grid-cols-2">
        <legend className="mb-2 font-bold text-pine-900">Base course and paving</legend>
        <Field label={L.baseCourseBasis} error={err('prices.baseCourse.basis')}>
          {(ids) => (
            <SelectInput
              id={ids.id}
              aria-describedby={ids.describedBy}
              value={form.baseBasis}
              onChange={(e) => change({ baseBasis: e.target.value as FormState['baseBasis'] })}
            >
              {baseCourseBases.map((b) => (
                <option key={b} value={b}>
                  {b === 'ton' ? 'the ton' : 'the square foot of landing and apron'}
                </option>
              ))}
            </SelectInput>
          )}
        </Field>
        {textBox(`${L.baseCoursePriceCents} ($)`, 'prices.baseCourse.priceCents', form.basePrice, (v) =>
          change({ basePrice: v }),
        )}
        {textBox(L.baseCourseDepthIn, 'prices.baseCourse.depthIn', form.baseDepthIn, (v) => change({ baseDepthIn: v }))}
        {textBox(
          L.baseCourseTonsPerCy,
          'prices.baseCourse.tonsPerCy',
          form.baseTonsPerCy,
          (v) => change({ baseTonsPerCy: v }),
          'Turns the area and depth into tons when priced by the ton.',
        )}
        {textBox(
          `${L.pavingPerSqFtCents} ($)`,
          'prices.pavingPerSqFtCents',
          form.paving,
          (v) => change({ paving: v }),
          'Leave empty if paving is not offered; quotes add it as a line the office can remove.',
        )}
      </fieldset>

      <fieldset className="grid gap-4 sm:grid-cols-2">
        <legend className="mb-2 font-bold text-pine-900">Every job</legend>
        {moneyBox('mobilisationCents', 'Bringing the machines to the site and back.')}
        {moneyBox('trafficControlPerDayCents')}
        {textBox(L.trafficControlDays, 'prices.trafficControlDays', form.trafficControlDays, (v) =>
          change({ trafficControlDays: v }),
        )}
        {moneyBox('permitFeeCents', 'The road authority’s fee, passed on at cost.')}
      </fieldset>

      <fieldset className="grid gap-4 sm:grid-cols-2">
        <legend className="mb-2 font-bold text-pine-900">Tax and deposit</legend>
        {textBox(`${L.salesTaxBp} (%)`, 'prices.salesTaxBp', form.salesTax, (v) => change({ salesTax: v }))}
        {textBox(
          `${L.depositBp} (%)`,
          'prices.depositBp',
          form.deposit,
          (v) => change({ deposit: v }),
          'Of the quote total, due on acceptance; rounded to the nearest cent, half a cent up.',
        )}
        <div className="sm:col-span-2">
          <p className="text-sm font-semibold text-stone-800">Lines that carry sales tax</p>
          <div className="mt-2 flex flex-wrap gap-4">
            {pricedKinds.map((kind) => (
              <label key={kind} className="flex items-center gap-2 text-sm">
                <input
                  type="checkbox"
                  checked={form.taxable[kind]}
                  onChange={(e) => change({ taxable: { ...form.taxable, [kind]: e.target.checked } })}
                />
                {lineKindLabels[kind]}
              </label>
            ))}
          </div>
        </div>
      </fieldset>

      <Field label={L.changeNote} error={err('changeNote')}>
        {(ids) => (
          <TextInput
            id={ids.id}
            aria-describedby={ids.describedBy}
            value={form.changeNote}
            onChange={(e) => change({ changeNote: e.target.value })}
          />
        )}
      </Field>

      {errorCount > 0 && (
        <Notice tone="error" title="Some prices need fixing">
          Each box with a problem says what it needs.
        </Notice>
      )}
      {!(update.error instanceof ApiError && Object.keys(serverErrors).length > 0) && (
        <ErrorNotice error={update.error} />
      )}
      <ErrorNotice error={publish.error} />
      <div className="flex flex-wrap items-center gap-3">
        <Button type="submit" disabled={update.isPending}>
          {update.isPending ? 'Saving…' : 'Save draft'}
        </Button>
        {!confirming ? (
          <Button variant="secondary" disabled={publish.isPending} onClick={() => setConfirming(true)}>
            Publish version {card.version}…
          </Button>
        ) : (
          <div
            role="group"
            aria-label="Confirm publishing"
            className="flex flex-wrap items-center gap-2 rounded border border-tape bg-amber-50 p-3"
          >
            <span className="text-sm">
              Publish version {card.version}? New quotes will use these prices; quotes already made keep theirs. A
              published version cannot be edited.
            </span>
            <Button
              disabled={publish.isPending}
              onClick={() =>
                void (dirty ? save() : Promise.resolve(true))
                  .then((ok) => (ok ? publish.mutateAsync(card.id) : undefined))
                  .then(() => setConfirming(false))
                  .catch(() => setConfirming(false))
              }
            >
              Yes, publish version {card.version}
            </Button>
            <Button variant="quiet" onClick={() => setConfirming(false)}>
              Cancel
            </Button>
          </div>
        )}
        {update.isSuccess && !dirty && (
          <span role="status" className="text-sm text-pine-800">
            Draft saved.
          </span>
        )}
      </div>
    </form>
  );
}
