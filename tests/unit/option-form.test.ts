/**
 * The option cards' form model maps to the engine's templates and back without loss, and every
 * field that does not read gets its own message at its own path (common practice, no source).
 */
import { describe, expect, it } from 'vitest';
import { demoPortfolio } from '@/demo/portfolio';
import { newOptionForm, templateToForm, toTemplates, type OptionType } from '@/lib/option-form';

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
    for (const type of ['expand', 'contract', 'abandon', 'defer', 'stage', 'switch'] as OptionType[]) {
      const { problems } = toTemplates([newOptionForm(type, 5, 120)], 5);
      expect({ type, problems }).toEqual({ type, problems: {} });
    }
  });

  it('name the field of each problem', () => {
    const expand = newOptionForm('expand', 5, 100);
    const abandon = newOptionForm('abandon', 5, 100);
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
      'options.0.share': 'Enter a number.',
      'options.0.window.to': 'Must not come before the opening year.',
      'options.1.label': 'Another option already has this name.',
      'options.1.cost.schedule.1.amount': 'Enter a number.',
      'options.1.cost.schedule.1.from': 'Must come after year 0.',
      'options.1.window.to': 'Must lie between year 0 and the horizon, year 5.',
    });
  });
});
