/**
 * The engine's input, as one zod schema shared by the engine, the API and the forms.
 * Shape checks live here (types, signs, ranges), with the words the option cards show beside
 * the field (the engine's own refusals are written from the rule, lattice/format-issues.ts); rules that relate fields to each other (mode
 * ids that exist, windows inside the horizon, no switching cycle that pays for itself) live in
 * `check-model.ts`, which runs right after this schema.
 */
import { z } from 'zod';
import { MAX_STEPS } from './limits';

const finite = z.number();
const years = z.number().min(0);
const id = z.string().min(1).max(64);

/** A money amount over time: constant, growing continuously, or a step schedule. */
export const costSchema = z.union([
  finite,
  z.strictObject({ amount: finite, growth: finite }),
  z.array(z.strictObject({ from: years, amount: finite })).min(1),
]);

export const windowSchema = z.discriminatedUnion('kind', [
  z.strictObject({ kind: z.literal('american'), from: years, to: years }),
  z.strictObject({
    kind: z.literal('bermudan'),
    dates: z
      .array(years)
      .min(1)
      .max(MAX_STEPS + 1),
  }),
  z.strictObject({ kind: z.literal('european'), at: years }),
]);

export const modeSchema = z.strictObject({
  id,
  scale: z.number().min(0),
  flowPerYear: finite.optional(),
  terminal: finite.optional(),
});

export const switchSchema = z.strictObject({
  id,
  from: z.array(id).min(1),
  to: id,
  cost: costSchema,
  window: windowSchema,
});

const expandSchema = z.strictObject({
  kind: z.literal('expand'),
  id: id.optional(),
  factor: z.number().gt(0, 'Must be above 0 %.'),
  cost: costSchema,
  window: windowSchema,
});
const contractSchema = z.strictObject({
  kind: z.literal('contract'),
  id: id.optional(),
  fraction: z.number().gt(0, 'Must be above 0 % and at most 100 %.').max(1, 'Must be above 0 % and at most 100 %.'),
  savings: costSchema,
  window: windowSchema,
});
const abandonSchema = z.strictObject({
  kind: z.literal('abandon'),
  id: id.optional(),
  /** Proceeds for the project at its base scale; they follow the scale sold unless `fixedSalvage`. */
  salvage: costSchema,
  /** The same proceeds whatever scale is left (an explicit choice, e.g. a fixed buy-back price). */
  fixedSalvage: z.boolean().optional(),
  window: windowSchema,
});
const deferSchema = z.strictObject({
  kind: z.literal('defer'),
  id: id.optional(),
  cost: costSchema,
  window: windowSchema,
});
const stageSchema = z.strictObject({
  kind: z.literal('stage'),
  id: id.optional(),
  payments: z
    .array(z.strictObject({ at: years, amount: z.number().min(0, 'Must be 0 or more.') }))
    .min(1)
    .max(12),
});
/** Pause operations (mothball) and restart them later: the template compiles to two switches between modes. */
const mothballSchema = z.strictObject({
  kind: z.literal('mothball'),
  id: id.optional(),
  toScale: z.number().min(0, 'Must be 0 or more.'),
  cost: costSchema,
  backCost: costSchema,
  flowPerYear: finite.optional(),
  window: windowSchema.optional(),
});

export const optionTemplateSchema = z.discriminatedUnion('kind', [expandSchema, contractSchema, abandonSchema, deferSchema, stageSchema, mothballSchema]);

export const treeKindSchema = z.enum(['crr', 'jarrow-rudd', 'tian', 'trigeorgis']);

export const projectModelSchema = z.strictObject({
  underlying: z.strictObject({
    value: z.number().gt(0),
    volatility: z.number().gt(0),
    payoutYield: z.number().min(0).optional(),
    payouts: z
      .array(z.strictObject({ at: years, fraction: z.number().min(0).lt(1) }))
      .max(MAX_STEPS)
      .optional(),
    /** Payouts earned over a period, paid evenly as a yield (a DCF schedule's years). */
    payoutPeriods: z
      .array(z.strictObject({ from: years, to: years, fraction: z.number().min(0).lt(1) }))
      .max(MAX_STEPS)
      .optional(),
  }),
  riskFreeRate: z.number().gt(-1).lt(1),
  horizon: z.number().gt(0).max(100),
  steps: z.number().int().min(1).max(MAX_STEPS),
  tree: treeKindSchema.optional(),
  investment: finite.optional(),
  modes: z.array(modeSchema).min(1).optional(),
  start: id.optional(),
  switches: z.array(switchSchema).optional(),
  options: z.array(optionTemplateSchema).max(12).optional(),
  /**
   * Ids of option templates already used before the valuation date (a followed case's recorded
   * decisions): the tree starts in the mode they made (docs/engine.md §10).
   */
  exercised: z.array(id).max(12).optional(),
});

export type Cost = z.infer<typeof costSchema>;
export type ExerciseWindow = z.infer<typeof windowSchema>;
export type ModeInput = z.infer<typeof modeSchema>;
export type SwitchInput = z.infer<typeof switchSchema>;
export type OptionTemplate = z.infer<typeof optionTemplateSchema>;
export type TreeKind = z.infer<typeof treeKindSchema>;
export type ProjectModel = z.infer<typeof projectModelSchema>;
