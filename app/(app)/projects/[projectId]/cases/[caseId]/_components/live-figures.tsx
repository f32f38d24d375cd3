'use client';

/**
 * The three headline figures computed in the browser from the draft, with what they rest on:
 * which fields on screen they ignore (not valid values), why the engine cannot value the draft,
 * or that they are live and not stored, and how the lattice's static NPV differs from the NPV
 * at the WACC when a defer cost or stage payments are in play.
 */
import type { ValuationResult } from '@/lattice';
import { formatMoney } from '@/lib/format';

function Headline({ label, value, strong, busy }: { label: string; value: string; strong?: boolean; busy: boolean }) {
  return (
    <div className={`rounded-card border px-4 py-3 ${strong ? 'border-tide-500 bg-tide-50' : 'border-line bg-paper-raised'}`}>
      <p className="text-caption font-medium uppercase tracking-wide text-ink-soft">{label}</p>
      <p className={`figures mt-0.5 text-title ${busy ? 'opacity-60' : ''}`} aria-live="polite">
        {value}
      </p>
    </div>
  );
}

interface Props {
  result: ValuationResult | null;
  currency: string;
  busy: boolean;
  /** Each field on screen that is not a valid value, in words; the figures use the last valid one. */
  ignored: string[];
  /** Why the engine cannot value the draft, in words, or null. */
  notValued: string | null;
  npvAtWacc: number | null;
}

export function LiveFigures({ result, currency, busy, ignored, notValued, npvAtWacc }: Props) {
  return (
    <>
      <div className="grid grid-cols-[minmax(0,1fr)] gap-4 sm:grid-cols-3">
        <Headline label="Static NPV" value={formatMoney(result?.staticNpv, currency)} busy={busy} />
        <Headline label="Option premium" value={formatMoney(result?.optionPremium, currency)} busy={busy} />
        <Headline label="Expanded NPV" value={formatMoney(result?.expandedNpv, currency)} strong busy={busy} />
      </div>
      {ignored.length > 0 ? (
        <p role="alert" className="-mt-3 rounded-md border border-brick-500 bg-brick-100 px-3 py-2 text-caption text-brick-700">
          These figures use the last valid values, not what is on screen: {ignored.join('; ')}. The case cannot be saved or valued until they are fixed.
        </p>
      ) : null}
      <p className="-mt-3 text-caption text-ink-muted" aria-live="polite">
        {notValued
          ? `Not valued: ${notValued}`
          : busy
            ? 'Recomputing in your browser…'
            : 'Computed live in your browser from the figures on screen; “Value case” stores a run on the server.'}
        {result && npvAtWacc !== null && Math.abs(result.staticNpv - npvAtWacc) > 0.05
          ? ` Static NPV here is the plan without flexibility as the lattice values it: a defer cost or stage payments are discounted at the risk-free rate (the NPV at the WACC is ${formatMoney(npvAtWacc, currency)}, see Cash flows).`
          : ''}
      </p>
    </>
  );
}
