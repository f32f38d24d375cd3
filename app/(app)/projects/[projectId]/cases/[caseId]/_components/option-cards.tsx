'use client';

import { useEffect, useRef } from 'react';
import { get, useFieldArray, useForm, useWatch, type Control, type FieldErrors, type Resolver, type UseFormRegister } from 'react-hook-form';
import { toNestErrors } from '@hookform/resolvers';
import { Button } from '@/components/ui/button';
import type { OptionTemplate } from '@/lattice';
import { newOptionForm, type CardBasis, optionKindLabels, templateToForm, toTemplates, type OptionForm, type OptionKind } from '@/lib/option-form';

type Fields = { options: OptionForm[] };

const explain: Record<OptionKind, string> = {
  expand: 'Pay a cost to scale the project up by a share of its value.',
  contract: 'Give up a share of the project for savings received.',
  abandon: 'Close the project for its salvage value.',
  defer: 'Wait before investing; the project starts once the cost is paid, or never.',
  stage: 'Each payment, on its date, buys the right to go on; skip one and the project stops.',
  mothball: 'Mothball the project (or run it at another scale) and restart it later, each for a cost.',
};

const field = 'h-9 rounded-md border border-line-strong bg-paper-raised px-2 text-body';

function Problem({ errors, path }: { errors: FieldErrors<Fields>; path: string }) {
  const message = (get(errors, path) as { message?: string } | undefined)?.message;
  return message ? (
    <span role="alert" className="text-caption text-brick-700">
      {message}
    </span>
  ) : null;
}

function Labelled({ label, children, hint }: { label: string; children: React.ReactNode; hint?: string }) {
  return (
    <label className="flex flex-col gap-1">
      <span className="text-caption font-medium uppercase tracking-wide text-ink-soft">{label}</span>
      {children}
      {hint ? <span className="text-caption text-ink-muted">{hint}</span> : null}
    </label>
  );
}

interface PartProps {
  at: string;
  register: UseFormRegister<Fields>;
  control: Control<Fields>;
  errors: FieldErrors<Fields>;
  readOnly: boolean;
}

/** A money amount over time: constant, growing a year, or a schedule by year. */
function CostEditor({ at, label, register, control, errors, readOnly }: PartProps & { label: string }) {
  const kind = useWatch({ control, name: `${at}.kind` as 'options.0.cost.kind' });
  const schedule = useFieldArray({ control, name: `${at}.schedule` as 'options.0.cost.schedule' });
  return (
    <fieldset className="flex flex-col gap-2">
      <legend className="mb-1 text-caption font-medium uppercase tracking-wide text-ink-soft">{label}</legend>
      <div className="flex flex-wrap items-start gap-3">
        <select aria-label={`${label}: how it changes`} className={field} disabled={readOnly} {...register(`${at}.kind` as 'options.0.cost.kind')}>
          <option value="constant">Constant</option>
          <option value="growing">Growing a year</option>
          <option value="scheduled">Scheduled by year</option>
        </select>
        {kind !== 'scheduled' ? (
          <div className="flex flex-col">
            <input
              aria-label={`${label}: amount`}
              inputMode="decimal"
              readOnly={readOnly}
              className={`${field} w-28 text-right`}
              {...register(`${at}.amount` as 'options.0.cost.amount')}
            />
            <Problem errors={errors} path={`${at}.amount`} />
          </div>
        ) : null}
        {kind === 'growing' ? (
          <div className="flex flex-col">
            <span className="flex items-center gap-1">
              <input
                aria-label={`${label}: growth a year (%)`}
                inputMode="decimal"
                readOnly={readOnly}
                className={`${field} w-20 text-right`}
                {...register(`${at}.growth` as 'options.0.cost.growth')}
              />
              <span className="text-caption text-ink-soft">% a year</span>
            </span>
            <Problem errors={errors} path={`${at}.growth`} />
          </div>
        ) : null}
      </div>
      {kind === 'scheduled' ? (
        <div className="flex flex-col gap-1">
          {schedule.fields.map((row, k) => (
            <div key={row.id} className="flex flex-wrap items-center gap-2">
              <span className="text-caption text-ink-soft">from year</span>
              <input
                aria-label={`${label}: period ${k + 1} starts in year`}
                inputMode="decimal"
                readOnly={readOnly}
                className={`${field} w-16 text-right`}
                {...register(`${at}.schedule.${k}.from` as 'options.0.cost.schedule.0.from')}
              />
              <span className="text-caption text-ink-soft">amount</span>
              <input
                aria-label={`${label}: period ${k + 1} amount`}
                inputMode="decimal"
                readOnly={readOnly}
                className={`${field} w-24 text-right`}
                {...register(`${at}.schedule.${k}.amount` as 'options.0.cost.schedule.0.amount')}
              />
              {readOnly || schedule.fields.length === 1 ? null : (
                <Button variant="quiet" onClick={() => schedule.remove(k)} aria-label={`Remove period ${k + 1} of ${label}`}>
                  Remove
                </Button>
              )}
              <Problem errors={errors} path={`${at}.schedule.${k}.from`} />
              <Problem errors={errors} path={`${at}.schedule.${k}.amount`} />
            </div>
          ))}
          {readOnly ? null : (
            <div>
              <Button variant="quiet" onClick={() => schedule.append({ from: '', amount: '' })}>
                Add a period
              </Button>
            </div>
          )}
        </div>
      ) : null}
    </fieldset>
  );
}

/** When the right can be used: any time in a span, on listed dates, or on one date. */
function WindowEditor({ at, register, control, errors, readOnly }: PartProps) {
  const kind = useWatch({ control, name: `${at}.kind` as 'options.0.window.kind' });
  return (
    <fieldset className="flex flex-col gap-2">
      <legend className="mb-1 text-caption font-medium uppercase tracking-wide text-ink-soft">When it can be used</legend>
      <div className="flex flex-wrap items-center gap-2">
        <select aria-label="Exercise window" className={field} disabled={readOnly} {...register(`${at}.kind` as 'options.0.window.kind')}>
          <option value="american">Any time between years</option>
          <option value="bermudan">On these years only</option>
          <option value="european">On one year only</option>
        </select>
        {kind === 'american' ? (
          <>
            <input
              aria-label="Window opens in year"
              inputMode="decimal"
              readOnly={readOnly}
              className={`${field} w-16 text-right`}
              {...register(`${at}.from` as 'options.0.window.from')}
            />
            <span className="text-caption text-ink-soft">and</span>
            <input
              aria-label="Window closes in year"
              inputMode="decimal"
              readOnly={readOnly}
              className={`${field} w-16 text-right`}
              {...register(`${at}.to` as 'options.0.window.to')}
            />
          </>
        ) : kind === 'bermudan' ? (
          <input
            aria-label="Exercise years, separated by commas"
            placeholder="1, 2, 3"
            readOnly={readOnly}
            className={`${field} w-40`}
            {...register(`${at}.dates` as 'options.0.window.dates')}
          />
        ) : (
          <input
            aria-label="Exercise year"
            inputMode="decimal"
            readOnly={readOnly}
            className={`${field} w-16 text-right`}
            {...register(`${at}.at` as 'options.0.window.at')}
          />
        )}
      </div>
      {(['from', 'to', 'dates', 'at'] as const).map((k) => (
        <Problem key={k} errors={errors} path={`${at}.${k}`} />
      ))}
    </fieldset>
  );
}

function StagePayments({ at, register, control, errors, readOnly }: PartProps) {
  const payments = useFieldArray({ control, name: `${at}.payments` as 'options.0.payments' });
  return (
    <fieldset className="flex flex-col gap-1">
      <legend className="mb-1 text-caption font-medium uppercase tracking-wide text-ink-soft">Payments</legend>
      {payments.fields.map((row, k) => (
        <div key={row.id} className="flex flex-wrap items-center gap-2">
          <span className="text-caption text-ink-soft">Stage {k + 1}: in year</span>
          <input
            aria-label={`Stage ${k + 1} year`}
            inputMode="decimal"
            readOnly={readOnly}
            className={`${field} w-16 text-right`}
            {...register(`${at}.payments.${k}.at` as 'options.0.payments.0.at')}
          />
          <span className="text-caption text-ink-soft">pay</span>
          <input
            aria-label={`Stage ${k + 1} amount`}
            inputMode="decimal"
            readOnly={readOnly}
            className={`${field} w-24 text-right`}
            {...register(`${at}.payments.${k}.amount` as 'options.0.payments.0.amount')}
          />
          {readOnly || payments.fields.length === 1 ? null : (
            <Button variant="quiet" onClick={() => payments.remove(k)} aria-label={`Remove stage ${k + 1}`}>
              Remove
            </Button>
          )}
          <Problem errors={errors} path={`${at}.payments.${k}.at`} />
          <Problem errors={errors} path={`${at}.payments.${k}.amount`} />
        </div>
      ))}
      <Problem errors={errors} path={`${at}.payments`} />
      {readOnly || payments.fields.length >= 12 ? null : (
        <div>
          <Button variant="quiet" onClick={() => payments.append({ at: '', amount: '' })}>
            Add a stage
          </Button>
        </div>
      )}
    </fieldset>
  );
}

interface Props {
  options: OptionTemplate[];
  horizon: number;
  /** What a fresh card is sized against (the project's value and the static plan's outlays). */
  basis: CardBasis;
  /** The engine's refusal of a card, by its position, in words. */
  engineProblems?: Record<number, string>;
  /** Cards whose right the live valuation finds used almost surely or never, by position (lib/usage-notes.ts). */
  usage?: Record<number, string>;
  readOnly: boolean;
  /** Called with the templates whenever every card reads; `problems` counts the fields that do not. */
  onChange: (templates: OptionTemplate[] | null, problems: number) => void;
}

/**
 * The flexibility management holds, one card per right, built with react-hook-form. Every edit
 * is read into the engine's templates (lib/option-form.ts, checked by the engine's own schema);
 * while a field does not read, its message shows beside it and the valuation keeps the last
 * good set of options.
 */
export function OptionCards({ options, horizon, basis, readOnly, onChange, engineProblems, usage }: Props) {
  const horizonRef = useRef(horizon);
  const resolver: Resolver<Fields> = async (values, _context, resolverOptions) => {
    const { problems } = toTemplates(values.options, horizonRef.current);
    if (Object.keys(problems).length === 0) return { values, errors: {} };
    const flat = Object.fromEntries(Object.entries(problems).map(([path, message]) => [path, { type: 'validate', message }]));
    return { values: {}, errors: toNestErrors(flat, resolverOptions) };
  };
  const form = useForm<Fields>({ resolver, mode: 'onChange', defaultValues: { options: options.map((o) => templateToForm(o, horizon)) } });
  const list = useFieldArray({ control: form.control, name: 'options' });
  const { errors } = form.formState;
  const onChangeRef = useRef(onChange);
  // The resolver and the subscription read the latest horizon and callback through refs.
  useEffect(() => {
    horizonRef.current = horizon;
    onChangeRef.current = onChange;
  });

  useEffect(
    () =>
      form.subscribe({
        formState: { values: true },
        callback: ({ values }) => {
          const { templates, problems } = toTemplates(values.options ?? [], horizonRef.current);
          const count = Object.keys(problems).length;
          onChangeRef.current(count === 0 ? templates : null, count);
        },
      }),
    [form],
  );
  // A change of horizon can move a window outside it: check again.
  useEffect(() => {
    void form.trigger();
  }, [horizon, form]);

  const add = (kind: OptionKind) => {
    list.append(newOptionForm(kind, basis));
    void form.trigger();
  };
  const remove = (k: number) => {
    list.remove(k);
    void form.trigger();
  };

  return (
    <form onSubmit={(e) => e.preventDefault()} noValidate className="flex flex-col gap-4">
      {list.fields.length === 0 ? (
        <p className="rounded-card border border-dashed border-line-strong bg-paper-raised px-6 py-8 text-center text-ink-soft">
          No options yet: the case is valued as a now-or-never commitment.{readOnly ? '' : ' Add the rights management really has below.'}
        </p>
      ) : null}
      {list.fields.map((card, k) => {
        const at = `options.${k}`;
        const parts = { register: form.register, control: form.control, errors, readOnly };
        const kind = card.kind;
        return (
          <section
            key={card.id}
            aria-label={`Right: ${optionKindLabels[kind]}`}
            className={`rounded-card border bg-paper-raised p-5 shadow-card ${engineProblems?.[k] ? 'border-brick-500' : 'border-line'}`}
          >
            {engineProblems?.[k] ? (
              <p role="alert" className="mb-3 rounded-md bg-brick-100 px-3 py-2 text-caption text-brick-700">
                The engine cannot use this right: {engineProblems[k]}
              </p>
            ) : usage?.[k] ? (
              <p className="mb-3 rounded-md border border-ember-500 bg-ember-100 px-3 py-2 text-caption text-ember-700">{usage[k]}</p>
            ) : null}
            <header className="mb-4 flex flex-wrap items-start gap-3">
              <span className="rounded bg-tide-50 px-2 py-1 text-caption font-semibold uppercase tracking-wide text-tide-700">{optionKindLabels[kind]}</span>
              <div className="flex flex-col">
                <input
                  aria-label="Name of the right"
                  placeholder="Name, e.g. Phase 2"
                  readOnly={readOnly}
                  className={`${field} w-56 font-medium`}
                  {...form.register(`options.${k}.label`)}
                />
                <Problem errors={errors} path={`${at}.label`} />
              </div>
              <p className="min-w-48 flex-1 pt-1.5 text-caption text-ink-muted">{explain[kind]}</p>
              {readOnly ? null : (
                <Button variant="quiet" onClick={() => remove(k)} aria-label={`Remove right ${k + 1} (${optionKindLabels[kind]})`}>
                  Remove
                </Button>
              )}
            </header>
            <div className="grid grid-cols-[minmax(0,1fr)] gap-5 lg:grid-cols-2">
              {kind === 'expand' || kind === 'contract' || kind === 'mothball' ? (
                <Labelled
                  label={kind === 'expand' ? 'Added scale (%)' : kind === 'contract' ? 'Share given up (%)' : 'Scale while mothballed (%)'}
                  hint={kind === 'expand' ? '50 adds half of the current project.' : kind === 'mothball' ? '0 stops operations (mothballed).' : undefined}
                >
                  <input inputMode="decimal" readOnly={readOnly} className={`${field} w-28 text-right`} {...form.register(`options.${k}.share`)} />
                  <Problem errors={errors} path={`${at}.share`} />
                </Labelled>
              ) : null}
              {kind === 'stage' ? (
                <StagePayments at={at} {...parts} />
              ) : (
                <CostEditor
                  at={`${at}.cost`}
                  label={
                    {
                      expand: 'Cost',
                      contract: 'Savings received',
                      abandon: 'Salvage received',
                      defer: 'Investment cost',
                      mothball: 'Cost to mothball',
                      stage: '',
                    }[kind]
                  }
                  {...parts}
                />
              )}
              {kind === 'abandon' ? (
                <label className="flex items-start gap-2 text-caption text-ink-soft">
                  <input type="checkbox" disabled={readOnly} className="mt-0.5" {...form.register(`options.${k}.fixedSalvage`)} />
                  <span>
                    The same amount whatever scale is left (for example a fixed offer for the site). Otherwise the salvage is for the plant as planned and
                    follows the scale sold: after contracting by 40 %, 60 % of it; after expanding by 50 %, 150 %.
                  </span>
                </label>
              ) : null}
              {kind === 'mothball' ? (
                <>
                  <CostEditor at={`${at}.backCost`} label="Cost to restart" {...parts} />
                  <Labelled label="Cash flow a year while mothballed" hint="Savings net of upkeep; negative for a net cost.">
                    <input inputMode="decimal" readOnly={readOnly} className={`${field} w-28 text-right`} {...form.register(`options.${k}.flowPerYear`)} />
                    <Problem errors={errors} path={`${at}.flowPerYear`} />
                  </Labelled>
                </>
              ) : null}
              {kind === 'stage' ? null : <WindowEditor at={`${at}.window`} {...parts} />}
            </div>
          </section>
        );
      })}
      {readOnly ? null : (
        <div className="flex flex-wrap items-center gap-2" role="group" aria-label="Add a right">
          <span className="text-caption font-medium uppercase tracking-wide text-ink-soft">Add a right:</span>
          {(Object.keys(optionKindLabels) as OptionKind[]).map((kind) => (
            <Button key={kind} variant="secondary" onClick={() => add(kind)}>
              {optionKindLabels[kind]}
            </Button>
          ))}
        </div>
      )}
    </form>
  );
}
