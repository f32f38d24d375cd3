/** The shared schemas refuse what the forms and the server must refuse, with readable messages. */
import { describe, expect, it } from 'vitest';
import { inviteSchema, resetPasswordSchema, signUpSchema } from '@/lib/validations/auth';
import { reviewStatusesSchema } from '@/lib/validations/review';
import { settingsSchema } from '@/lib/validations/settings';

describe('schemas', () => {
  it('sign-up needs a name, a valid e-mail and a 10-character password', () => {
    const r = signUpSchema.safeParse({ name: 'A', email: 'not-an-email', password: 'short' });
    expect(r.success).toBe(false);
    expect(r.error!.flatten().fieldErrors).toEqual({
      name: ['Enter your name.'],
      email: ['Enter a valid e-mail address.'],
      password: ['Use at least 10 characters.'],
    });
  });

  it('sign-up normalises the e-mail', () => {
    expect(signUpSchema.parse({ name: 'Ada', email: '  Ada@Example.COM ', password: 'long enough pw' }).email).toBe('ada@example.com');
  });

  it('invitations take only the four roles', () => {
    expect(inviteSchema.safeParse({ email: 'a@b.co', role: 'owner' }).success).toBe(false);
    expect(inviteSchema.safeParse({ email: 'a@b.co', role: 'reviewer' }).success).toBe(true);
  });

  it('a new password must be typed twice the same', () => {
    const r = resetPasswordSchema.safeParse({ password: 'a long password', confirm: 'another one' });
    expect(r.error!.flatten().fieldErrors.confirm).toEqual(['The two passwords differ.']);
  });

  it('settings keep rates as fractions in sensible ranges and currencies as ISO codes', () => {
    expect(settingsSchema.parse({ currency: 'eur', riskFreeRate: 0.03, wacc: 0.085, fiscalYearStartMonth: 4 })).toEqual({
      currency: 'EUR',
      riskFreeRate: 0.03,
      wacc: 0.085,
      fiscalYearStartMonth: 4,
    });
    const bad = settingsSchema.safeParse({ currency: 'EURO', riskFreeRate: 3, wacc: -1, fiscalYearStartMonth: 13 });
    expect(Object.keys(bad.error!.flatten().fieldErrors).sort()).toEqual(['currency', 'fiscalYearStartMonth', 'riskFreeRate', 'wacc']);
  });

  it("the review queue's ?status= takes its three values, comma-separated, and names itself when refused", () => {
    expect(reviewStatusesSchema.parse('approved,returned')).toEqual(['approved', 'returned']);
    expect(reviewStatusesSchema.parse('in_review')).toEqual(['in_review']);
    for (const bad of ['\u0000', 'approved,', 'APPROVED', 'approved,draft']) {
      const r = reviewStatusesSchema.safeParse(bad);
      expect(r.success).toBe(false);
      expect(r.error!.issues.map((i) => [i.path, i.message])).toEqual([
        [[], 'status must be in_review, approved or returned, or several of them comma-separated.'],
      ]);
    }
  });
});
