'use client';

import { useEffect, useState } from 'react';
import type { z } from 'zod';
import { readNumberText } from '@/lib/number-text';
import { useReportProblem } from './field-problems';
import { Input } from './ui/input';

interface Props {
  label: string;
  /** The model's value (a fraction when `percent`). */
  value: number;
  onChange: (value: number) => void;
  /** Shown and typed as a percentage, stored as a fraction. */
  percent?: boolean;
  /**
   * The range the server enforces, read from the same zod schema (lib/validations/, lib/cash-flows.ts):
   * the field says the schema's own message, so the rule and its words are written once.
   */
  schema?: z.ZodType<number>;
  /** A rule that depends on other fields (the steps a case's rights may use); returns a message or null. */
  check?: (value: number) => string | null;
  hint?: string;
  readOnly?: boolean;
  integer?: boolean;
  className?: string;
}

const show = (value: number, percent: boolean) => (percent ? String(Number((value * 100).toFixed(6))) : String(value));

/**
 * A number input that lets people type freely: the text is kept as typed, and the model only
 * changes when it reads as a valid number (lib/number-text.ts); otherwise the field says what is
 * wrong and reports it to the form around it (components/field-problems.tsx), which then will not
 * save.
 */
export function NumberField({ label, value, onChange, percent = false, schema, check, hint, readOnly, integer, className }: Props) {
  const [text, setText] = useState(show(value, percent));
  const [error, setError] = useState<string | null>(null);
  // Follow outside changes (a reload, an import) without fighting the user's typing: adjust
  // the text while rendering when the model's value moved away from what the text says.
  const [seen, setSeen] = useState(value);
  if (value !== seen) {
    setSeen(value);
    if (Number(text) * (percent ? 0.01 : 1) !== value) setText(show(value, percent));
  }
  const report = useReportProblem();
  const field = percent ? `${label} (%)` : label;
  // A field that goes away takes its problem with it.
  useEffect(() => () => report(field, null), [report, field]);
  const change = (next: string) => {
    setText(next);
    const read = readNumberText(next);
    const model = read.ok ? (percent ? read.value / 100 : read.value) : NaN;
    const problem = !read.ok
      ? read.message
      : integer && !Number.isInteger(read.value)
        ? 'Enter a whole number.'
        : (schema?.safeParse(model).error?.issues[0]?.message ?? check?.(model) ?? null);
    setError(problem);
    report(field, problem);
    if (!problem && read.ok) onChange(model);
  };
  return (
    <Input
      label={field}
      inputMode="decimal"
      value={text}
      onChange={(e) => change(e.target.value)}
      error={error ?? undefined}
      hint={hint}
      readOnly={readOnly}
      className={className}
    />
  );
}
