'use client';

import { FormProblem } from '@/components/form-problem';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';

interface Props {
  open: boolean;
  text: string;
  onText: (text: string) => void;
  /** Leeway's reading of the figures on screen, offered as a start; null while there are none. */
  suggestion: string | null;
  /** What the committee would read as missing (lib/submission-gaps.ts); it does not block. */
  gaps: string[];
  busy: boolean;
  problem: string | null;
  onSubmit: () => void;
  onClose: () => void;
}

/**
 * Submitting asks the analyst for their recommendation to the committee, in their own words: the
 * board pack prints it. Leeway's reading of the figures can be copied in as a start, and is
 * printed beside it in the pack as generated text.
 */
export function SubmitDialog({ open, text, onText, suggestion, gaps, busy, problem, onSubmit, onClose }: Props) {
  return (
    <Dialog open={open} title="Submit for review" onClose={onClose}>
      <form
        onSubmit={(e) => {
          e.preventDefault();
          onSubmit();
        }}
        className="flex flex-col gap-3"
      >
        <label className="flex flex-col gap-1">
          <span className="text-caption font-medium uppercase tracking-wide text-ink-soft">Your recommendation to the committee</span>
          <textarea
            autoFocus
            value={text}
            onChange={(e) => onText(e.target.value)}
            rows={6}
            maxLength={4000}
            aria-describedby="recommendation-hint"
            className="rounded-md border border-line-strong bg-paper-raised px-3 py-2"
          />
          <span id="recommendation-hint" className="text-caption text-ink-muted">
            What you recommend and on what conditions. It is frozen with this version and printed in the board pack.
          </span>
        </label>
        {suggestion ? (
          <div className="rounded-md bg-paper-sunk px-3 py-2 text-caption text-ink-soft">
            <p>Leeway&rsquo;s reading of the figures: {suggestion}</p>
            <Button variant="quiet" className="mt-1 px-0" onClick={() => onText(text.trim() ? `${text.trim()}\n\n${suggestion}` : suggestion)}>
              Copy it into my recommendation
            </Button>
          </div>
        ) : null}
        {gaps.length > 0 ? (
          <div className="rounded-md border border-ember-500 bg-ember-100 px-3 py-2 text-caption text-ember-700">
            <p className="font-semibold">Before the committee reads it</p>
            <ul className="mt-1 list-disc pl-4">
              {gaps.map((gap) => (
                <li key={gap}>{gap}</li>
              ))}
            </ul>
          </div>
        ) : null}
        <FormProblem message={problem} />
        <div className="flex justify-end gap-2">
          <Button variant="secondary" onClick={onClose}>
            Cancel
          </Button>
          <Button type="submit" busy={busy} disabled={text.trim().length === 0}>
            Submit for review
          </Button>
        </div>
      </form>
    </Dialog>
  );
}
