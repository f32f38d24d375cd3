/**
 * The compiled form every valuation runs on: operating modes, the switches between them (one
 * per origin mode), and the rights the user named (a template or a raw switch), which are what
 * results are reported for.
 */
import type { Cost, ExerciseWindow, OptionTemplate } from './schema';
import type { Money } from './units';

export interface CompiledMode {
  id: string;
  scale: number;
  flowPerYear: Money;
  terminal: Money;
}

export interface CompiledSwitch {
  /** Index of the right this switch belongs to. */
  right: number;
  from: number;
  to: number;
  cost: Cost;
  window: ExerciseWindow;
  /** Where the cost and window came from in the input, for messages and snaps. */
  field: string;
}

/** A template's type, or `custom` for a switch given directly (the advanced form). */
export type RightKind = OptionTemplate['kind'] | 'custom';

export interface Right {
  id: string;
  kind: RightKind;
  field: string;
  /** The mode from which the right is first exercised; its boundary is reported from there. */
  primaryFrom: number;
}

export interface CompiledModel {
  modes: CompiledMode[];
  switches: CompiledSwitch[];
  rights: Right[];
  start: number;
  /**
   * The static (no-flexibility) plan: committed today to run in `mode` from `enter` on and to
   * pay `outlays`, each on the first step its window opens (lattice/window.ts, so the plan is one
   * the lattice can follow). Usually entry today and one outlay today (the investment); with a
   * defer window opening later it is "build at the first date the window allows", and with
   * staged payments "pay every stage and operate after the last".
   */
  staticPlan: { mode: number; enter: ExerciseWindow; outlays: { on: ExerciseWindow; cost: Cost }[] };
  /** The static plan's outlays in present value at t = 0, for variants that build now. */
  staticInvestment: Money;
  /** The outlay charged against the lattice value to get the expanded NPV. */
  upfront: Money;
}
