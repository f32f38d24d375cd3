/**
 * The premium's two parts in words (lib/premium-split.ts), as Results, the board pack and the
 * validation report print them. Each figure is rounded to one decimal on its own, so the parts
 * can read 0.1 away from the premium (the demo plant: 16.0 + 15.2 against 31.1); the sentence
 * then says so, and only then.
 */
import { describe, expect, it } from 'vitest';
import { premiumSplitText } from '@/lib/premium-split';

const words = (premium: number, betterPlan: number, uncertainty: number) =>
  premiumSplitText({ optionPremium: premium, premiumSplit: { betterPlan, uncertainty } }, 'EUR')!;

describe('the premium split in words', () => {
  it('says the parts are rounded on their own when they do not add up as shown', () => {
    const text = words(31.12, 15.96, 15.16);
    expect(text).toContain('EUR 31.1');
    expect(text).toContain('EUR 16.0 is a better plan');
    expect(text).toContain('EUR 15.2 is flexibility');
    expect(text).toMatch(/Each figure is rounded on its own, so the two parts differ from the premium by 0\.1\.$/);
  });

  it('adds nothing when the parts add up as shown, negative parts and thousands included', () => {
    expect(words(31.1, 16.04, 15.06)).toMatch(/flexibility under uncertainty\.$/);
    expect(words(1234.5, 1300.2, -65.7)).toMatch(/flexibility under uncertainty\.$/);
  });

  it('says nothing without a split', () => {
    expect(premiumSplitText({ optionPremium: 3, premiumSplit: null })).toBeNull();
  });
});
