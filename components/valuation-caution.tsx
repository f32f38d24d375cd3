import { VALUATION_CAUTION } from '@/lib/caution';

/** The caution (lib/caution.ts) as it stands under results on a page. */
export function ValuationCaution() {
  return <p className="rounded-md border border-line bg-paper-sunk px-4 py-3 text-caption text-ink-soft">{VALUATION_CAUTION}</p>;
}
