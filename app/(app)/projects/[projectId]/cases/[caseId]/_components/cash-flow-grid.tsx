'use client';

import { useState, type ClipboardEvent, type KeyboardEvent } from 'react';
import { Button } from '@/components/ui/button';
import type { CashFlowAnalysis, CashFlowYear } from '@/lib/cash-flows';
import { formatNumber } from '@/lib/format';
import { numberOrNull, readNumberText } from '@/lib/number-text';

type Line = Exclude<keyof CashFlowYear, 'year'>;

const lines: { key: Line; label: string; hint: string }[] = [
  { key: 'revenue', label: 'Revenue', hint: 'Sales in the year' },
  { key: 'operatingCost', label: 'Operating cost', hint: 'Cash operating costs, as a positive number' },
  { key: 'tax', label: 'Tax', hint: 'Cash tax paid' },
  { key: 'workingCapital', label: 'Working capital increase', hint: 'Cash tied up (negative when released)' },
  { key: 'capex', label: 'Capex', hint: 'Capital spending, as a positive number' },
];

interface Props {
  rows: CashFlowYear[];
  analysis: CashFlowAnalysis | null;
  readOnly: boolean;
  onChange: (rows: CashFlowYear[]) => void;
  /** Tells the editor how many cells hold text that is not a number (saving waits until there are none). */
  onInvalidCount: (count: number) => void;
}

/**
 * The cash-flow schedule as finance people lay it out: line items down, years across, totals on
 * the right, free cash flow computed. Arrow keys and Enter move between cells like a spreadsheet.
 * What a person types stays exactly as typed until they leave the cell ("23." is kept while a
 * "5" is on its way); each readable value goes into the model at once, so the figures follow.
 * A cell holding something that is not a number — or an ambiguous comma, lib/number-text.ts —
 * is marked and explained, and keeps the last good value in the model until it is fixed. A block
 * copied from a spreadsheet (tab-separated, several rows and years) pastes from the cell.
 */
export function CashFlowGrid({ rows, analysis, readOnly, onChange, onInvalidCount }: Props) {
  const [drafts, setDrafts] = useState<Record<string, string>>({});
  const [pasteNote, setPasteNote] = useState<string | null>(null);
  const key = (line: Line, col: number) => `${line}:${col}`;

  const setDraft = (next: Record<string, string>) => {
    setDrafts(next);
    onInvalidCount(Object.values(next).filter((t) => numberOrNull(t) === null).length);
  };

  const edit = (line: Line, col: number, text: string) => {
    const value = numberOrNull(text);
    if (value !== null) onChange(rows.map((r, k) => (k === col ? { ...r, [line]: value } : r)));
    setDraft({ ...drafts, [key(line, col)]: text });
  };

  /** Leaving a cell: readable text gives way to the stored value; unreadable text stays, marked. */
  const leave = (line: Line, col: number) => {
    const text = drafts[key(line, col)];
    if (text === undefined || numberOrNull(text) === null) return;
    const next = { ...drafts };
    delete next[key(line, col)];
    setDraft(next);
  };

  const paste = (event: ClipboardEvent<HTMLInputElement>, row: number, col: number) => {
    const text = event.clipboardData.getData('text/plain');
    if (!/[\t\n]/.test(text.trim())) return;
    event.preventDefault();
    const block = text
      .replace(/\r/g, '')
      .replace(/\n+$/, '')
      .split('\n')
      .map((l) => l.split('\t'));
    const nextRows = rows.map((r) => ({ ...r }));
    const nextDrafts = { ...drafts };
    let outside = 0;
    block.forEach((cells, r) =>
      cells.forEach((cell, c) => {
        const line = lines[row + r]?.key;
        const target = nextRows[col + c];
        if (!line || !target) {
          outside++;
          return;
        }
        const value = numberOrNull(cell);
        if (value !== null) {
          target[line] = value;
          delete nextDrafts[key(line, col + c)];
        } else nextDrafts[key(line, col + c)] = cell;
      }),
    );
    onChange(nextRows);
    setDraft(nextDrafts);
    setPasteNote(
      outside > 0
        ? `${outside} pasted value${outside > 1 ? 's' : ''} fell outside the grid and ${outside > 1 ? 'were' : 'was'} left out; add years first.`
        : null,
    );
  };

  const move = (event: KeyboardEvent<HTMLInputElement>, row: number, col: number) => {
    const input = event.currentTarget;
    const atStart = input.selectionStart === 0 && input.selectionEnd === 0;
    const atEnd = input.selectionStart === input.value.length;
    let target: [number, number] | null = null;
    if (event.key === 'ArrowUp') target = [row - 1, col];
    else if (event.key === 'ArrowDown' || event.key === 'Enter') target = [row + 1, col];
    else if (event.key === 'ArrowLeft' && atStart) target = [row, col - 1];
    else if (event.key === 'ArrowRight' && atEnd) target = [row, col + 1];
    if (!target) return;
    const next = document.querySelector<HTMLInputElement>(`[data-cell="${target[0]}:${target[1]}"]`);
    if (!next) return;
    event.preventDefault();
    next.focus();
    next.select();
  };

  const addYear = () => {
    const last = rows.at(-1)!;
    onChange([...rows, { ...last, year: last.year + 1 }]);
  };
  const removeYear = () => {
    const col = rows.length - 1;
    setDraft(Object.fromEntries(Object.entries(drafts).filter(([k]) => !k.endsWith(`:${col}`))));
    onChange(rows.slice(0, -1));
  };

  const problems = Object.entries(drafts).flatMap(([k, text]) => {
    const read = readNumberText(text);
    if (read.ok) return [];
    const [line, col] = k.split(':');
    return [`${lines.find((l) => l.key === line)?.label}, year ${rows[Number(col)]?.year}: ${read.message}`];
  });
  const total = (line: Line) => rows.reduce((s, r) => s + r[line], 0);

  return (
    <div>
      <div className="relative overflow-x-auto rounded-card border border-line bg-paper-raised shadow-card">
        <table className="figures w-full border-collapse text-right text-body">
          <caption className="sr-only">Cash flows by year; arrow keys move between cells.</caption>
          <thead>
            <tr>
              <th
                scope="col"
                className="sticky left-0 border-b border-line bg-paper-sunk px-2 py-2 text-left text-caption font-semibold uppercase tracking-wide text-ink-soft"
              >
                Year
              </th>
              {rows.map((r) => (
                <th key={r.year} scope="col" className="min-w-16 border-b border-line bg-paper-sunk px-2 py-2 text-caption font-semibold text-ink-soft">
                  {r.year}
                </th>
              ))}
              <th
                scope="col"
                className="border-b border-l border-line bg-paper-sunk px-2 py-2 text-caption font-semibold uppercase tracking-wide text-ink-soft"
              >
                Total
              </th>
            </tr>
          </thead>
          <tbody>
            {lines.map((line, row) => (
              <tr key={line.key}>
                <th
                  scope="row"
                  title={line.hint}
                  className="sticky left-0 min-w-36 max-w-44 border-b border-line bg-paper-raised px-2 py-1 text-left font-normal leading-tight text-ink-soft"
                >
                  {line.label}
                </th>
                {rows.map((r, col) => {
                  const draft = drafts[key(line.key, col)];
                  const invalid = draft !== undefined && numberOrNull(draft) === null;
                  return (
                    <td key={r.year} className="border-b border-line px-0.5 py-1">
                      <input
                        data-cell={`${row}:${col}`}
                        aria-label={`${line.label}, year ${r.year}`}
                        aria-invalid={invalid || undefined}
                        inputMode="decimal"
                        readOnly={readOnly}
                        value={draft ?? String(r[line.key])}
                        onChange={(e) => edit(line.key, col, e.target.value)}
                        onKeyDown={(e) => move(e, row, col)}
                        onBlur={() => leave(line.key, col)}
                        onPaste={(e) => paste(e, row, col)}
                        onFocus={(e) => e.currentTarget.select()}
                        className={`h-8 w-full min-w-16 rounded border px-1 text-right ${invalid ? 'border-brick-500 bg-brick-100' : 'border-transparent hover:border-line focus:border-tide-500'} ${readOnly ? 'bg-transparent' : ''}`}
                      />
                    </td>
                  );
                })}
                <td className="border-b border-l border-line px-2 py-1 text-ink-soft">{formatNumber(total(line.key))}</td>
              </tr>
            ))}
            <tr className="bg-tide-50/60 font-semibold">
              <th scope="row" className="sticky left-0 bg-tide-50 px-2 py-2 text-left">
                Free cash flow
              </th>
              {rows.map((r, col) => (
                <td key={r.year} className="px-1.5 py-2">
                  {formatNumber(analysis?.rows[col]?.freeCashFlow)}
                </td>
              ))}
              <td className="border-l border-line px-2 py-2">{formatNumber(analysis?.totals.freeCashFlow)}</td>
            </tr>
            <tr className="text-ink-soft">
              <th scope="row" className="sticky left-0 bg-paper-raised px-2 py-1 text-left font-normal">
                Discount factor
              </th>
              {rows.map((r, col) => (
                <td key={r.year} className="px-1.5 py-1">
                  {analysis?.rows[col]?.discountFactor.toFixed(4) ?? '–'}
                </td>
              ))}
              <td className="border-l border-line" />
            </tr>
            <tr className="text-ink-soft">
              <th scope="row" className="sticky left-0 bg-paper-raised px-2 py-1 text-left font-normal">
                Present value
              </th>
              {rows.map((r, col) => (
                <td key={r.year} className="px-1.5 py-1">
                  {formatNumber(analysis?.rows[col]?.presentValue)}
                </td>
              ))}
              <td className="border-l border-line px-2 py-1">{formatNumber(analysis?.npvAtWacc)}</td>
            </tr>
          </tbody>
        </table>
      </div>
      {pasteNote ? (
        <p role="status" className="mt-2 text-caption text-ember-700">
          {pasteNote}
        </p>
      ) : null}
      {problems.length > 0 ? (
        <ul role="alert" className="mt-2 list-disc pl-5 text-caption text-brick-700">
          {problems.map((p) => (
            <li key={p}>{p}</li>
          ))}
        </ul>
      ) : null}
      {readOnly ? null : (
        <div className="mt-3 flex gap-2">
          <Button variant="secondary" onClick={addYear} disabled={rows.length >= 60}>
            Add a year
          </Button>
          <Button variant="secondary" onClick={removeYear} disabled={rows.length <= 1}>
            Remove year {rows.at(-1)?.year}
          </Button>
        </div>
      )}
    </div>
  );
}
