/**
 * The option cards' form model maps to the engine's templates and back without loss, and every
 * field that does not read gets its own message at its own path (common practice, no source).
 */
import { describe, expect, it } from 'vitest';
import { demoPortfolio } from '@/demo/portfolio';
import { isPlanLike, valueProject } from '@/lattice';
import { caseToModel } from '@/lib/case-model';
import { analyseCashFlows } from '@/lib/cash-flows';
import { cardBasis, kindBesideName, nameWithKind, newOptionForm, templateToForm, toTemplates, type CardBasis, type OptionKind } from '@/lib/option-form';

const basis = (v0: number, horizon = 5): CardBasis => ({
  horizon,
  v0,
  investment: 0.8 * v0,
  stagePayments: [{ at: 0, amount: 0.8 * v0 }],
  lastSale: horizon - 1,
  valueAtLastSale: 0.3 * v0,
  firstEarning: 1,
});

describe('option cards', () => {
  it('turn every demo option into a form and back into the same template', () => {
    for (const project of demoPortfolio)
      for (const c of project.cases) {
        const options = c.options ?? [];
        const { templates, problems } = toTemplates(
          options.map((o) => templateToForm(o, 10)),
          10,
        );
        expect(problems).toEqual({});
        expect(templates).toEqual(options);
      }
  });

  it('start every kind of card from figures the engine accepts', () => {
    for (const kind of ['expand', 'contract', 'abandon', 'defer', 'stage', 'mothball'] as OptionKind[]) {
      const { problems } = toTemplates([newOptionForm(kind, basis(120))], 5);
      expect({ kind, problems }).toEqual({ kind, problems: {} });
    }
  });

  it('name the field of each problem', () => {
    const expand = newOptionForm('expand', basis(100));
    const abandon = newOptionForm('abandon', basis(100));
    const { problems } = toTemplates(
      [
        { ...expand, share: 'lots', window: { ...expand.window, from: '4', to: '2' } },
        {
          ...abandon,
          label: expand.label,
          cost: {
            kind: 'scheduled',
            amount: '',
            growth: '0',
            schedule: [
              { from: '0', amount: '50' },
              { from: '0', amount: 'x' },
            ],
          },
          window: { ...abandon.window, to: '7' },
        },
      ],
      5,
    );
    expect(problems).toEqual({
      'options.0.share': '“lots” is not a number.',
      'options.0.window.to': 'Must not come before the opening year.',
      'options.1.label': 'Another right already has this name.',
      'options.1.cost.schedule.1.amount': '“x” is not a number.',
      'options.1.cost.schedule.1.from': 'Must come after year 0.',
      'options.1.window.to': 'Must lie between year 0 and the horizon, year 5.',
    });
  });

  it("say the engine schema's own words for a share or a payment out of its range, at the card's field", () => {
    const b = basis(100);
    const stage = newOptionForm('stage', b);
    const { problems } = toTemplates(
      [
        { ...newOptionForm('expand', b), share: '0' },
        { ...newOptionForm('contract', b), share: '150' },
        { ...newOptionForm('mothball', b), share: '-10' },
        { ...stage, payments: [{ at: '0', amount: '-5' }] },
      ],
      5,
    );
    expect(problems).toEqual({
      'options.0.share': 'Must be above 0 %.',
      'options.1.share': 'Must be above 0 % and at most 100 %.',
      'options.2.share': 'Must be 0 or more.',
      'options.3.payments.0.amount': 'Must be 0 or more.',
    });
  });

  it('start a sale, a contraction or a pause as a real choice: neither used for certain nor never', () => {
    // Sized on V0 and open to the horizon, both were used with probability 100 % on every demo
    // schedule: near the end the project is worth little and at the horizon nothing, so selling
    // for half of V0 was a certain gain. Each demo project's base case (invented figures), alone
    // and beside a fresh expansion.
    for (const project of demoPortfolio) {
      const input = { ...project.cases[0]!, options: [] };
      const horizon = input.cashFlows.rows.at(-1)!.year;
      const b = cardBasis(analyseCashFlows(input.cashFlows), horizon, input.settings.riskFreeRate);
      // A pause that saved nothing a year was never used; one open before the pilot line earns
      // was a certain gain.
      for (const kinds of [['abandon'], ['contract'], ['mothball'], ['expand', 'abandon'], ['abandon', 'mothball']] as OptionKind[][]) {
        const { templates, problems } = toTemplates(
          kinds.map((kind) => newOptionForm(kind, b)),
          horizon,
        );
        expect(problems).toEqual({});
        const rights = valueProject(caseToModel({ ...input, options: templates }).model, { extras: false }).rights;
        const read = rights.map((r) => ({ right: r.id, planLike: isPlanLike(r), used: r.exerciseProbability > 0 }));
        expect({ project: project.name, read }).toEqual({ project: project.name, read: rights.map((r) => ({ right: r.id, planLike: false, used: true })) });
      }
    }
  });

  it('print a right’s kind beside its name only when the name is not the kind’s own', () => {
    // A fresh card keeps its kind's name: Results and the board pack read "Expand (Expand)".
    expect(kindBesideName('Expand', 'expand')).toBeNull();
    expect(kindBesideName(' contract ', 'contract')).toBeNull();
    expect(kindBesideName('Mothball', 'mothball')).toBe('Mothball & restart');
    expect(kindBesideName('Phase 2', 'expand')).toBe('Expand');
    expect(kindBesideName('abandon-1', 'abandon')).toBe('Abandon');
    expect([nameWithKind('Expand', 'expand'), nameWithKind('Phase 2', 'expand')]).toEqual(['Expand', 'Phase 2 (Expand)']);
  });

  it('start a Defer or a Stage card from the static plan, so adding one leaves the NPV without flexibility where it was', () => {
    // The demo plant (capex at year 0) and pilot line (capex over years 0–2), invented figures.
    // The tolerance is the rounding of each amount to cents: 0.005 per payment.
    for (const [project, tolerance] of [
      ['Phased bio-resin plant', 0.005],
      ['Staged pilot line', 0.015],
    ] as const) {
      const input = { ...demoPortfolio.find((p) => p.name === project)!.cases[0]!, options: [] };
      const without = valueProject(caseToModel(input).model, { extras: false }).staticNpv;
      const analysis = analyseCashFlows(input.cashFlows);
      const horizon = input.cashFlows.rows.at(-1)!.year;
      for (const type of ['defer', 'stage'] as const) {
        const { templates, problems } = toTemplates([newOptionForm(type, cardBasis(analysis, horizon, input.settings.riskFreeRate))], horizon);
        expect(problems).toEqual({});
        const withCard = valueProject(caseToModel({ ...input, options: templates }).model, { extras: false }).staticNpv;
        expect({ project, type, moved: Math.abs(withCard - without) <= tolerance ? 'no' : withCard - without }).toEqual({ project, type, moved: 'no' });
      }
    }
  });
});
