/** Engine messages name rights by their cards, not by their index in the model. */
import { describe, expect, it } from 'vitest';
import type { OptionTemplate } from '@/lattice';
import { issueInWords } from '@/lib/issue-words';

const options = [
  { kind: 'defer', id: 'Build', cost: 90, window: { kind: 'american', from: 0, to: 2 } },
  { kind: 'stage', payments: [{ at: 0, amount: 10 }] },
] as OptionTemplate[];

describe('engine messages in words', () => {
  it('names the card', () => {
    expect(issueInWords('options[1] cannot be combined with a defer right: make the first stage payment the defer cost', options)).toBe(
      'right “Right 2” cannot be combined with a defer right: make the first stage payment the defer cost',
    );
    expect(issueInWords('options[0].window.to must be ≤ horizon (5), got 7', options)).toBe('right “Build” (window closes (to)) must be ≤ horizon (5), got 7');
    expect(issueInWords('options[1].payments[0].at must be ≤ horizon', options)).toBe('right “Right 2” (payment 1 date (at)) must be ≤ horizon');
  });
});
