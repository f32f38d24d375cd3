/** Chart labels are wrapped by words to fit their width, never cut mid-label without a mark. */
import { describe, expect, it } from 'vitest';
import { wrapLabel } from '@/lib/charts/wrap-label';

describe('wrapLabel', () => {
  it('keeps a label that fits on one line', () => {
    expect(wrapLabel('Phase 2', 100, 7.5)).toEqual(['Phase 2']);
  });

  it('wraps by words into lines that fit (19 characters in 80 pt at 7.5 pt)', () => {
    const lines = wrapLabel('Together vs. alone, the interaction', 80, 7.5);
    expect(lines).toEqual(['Together vs. alone,', 'the interaction']);
  });

  it('marks a label longer than its lines with an ellipsis', () => {
    const lines = wrapLabel('one two three four five six seven eight nine ten', 40, 7.5, 2);
    expect(lines).toHaveLength(2);
    expect(lines[1]!.endsWith('…')).toBe(true);
  });
});
