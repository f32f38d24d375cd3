/**
 * The four trees the engine offers, and the no-arbitrage check they all pass before use.
 */
import { refuse } from '../errors';
import type { TreeKind } from '../schema';
import { crrStep } from './crr';
import { jarrowRuddStep } from './jarrow-rudd';
import { tianStep } from './tian';
import { trigeorgisStep } from './trigeorgis';
import type { TreeInput, TreeStep } from './types';

export type { TreeInput, TreeStep } from './types';

const builders: Record<TreeKind, (input: TreeInput) => TreeStep> = {
  crr: crrStep,
  'jarrow-rudd': jarrowRuddStep,
  tian: tianStep,
  trigeorgis: trigeorgisStep,
};

/**
 * Builds one step of the chosen tree and refuses it unless 0 < p < 1 and
 * d < e^{(r−δ)Δt} < u (otherwise a riskless profit would exist on the tree).
 */
export function treeStep(kind: TreeKind, input: TreeInput): TreeStep {
  const step = builders[kind](input);
  const growth = Math.exp((input.riskFreeRate - input.payoutYield) * input.dt);
  const ok = step.p > 0 && step.p < 1 && step.d < growth && growth < step.u;
  if (!ok || !Number.isFinite(step.u) || !Number.isFinite(step.d)) {
    const f = (x: number) => x.toPrecision(6);
    refuse(
      'steps',
      `gives a ${kind} tree with risk-neutral probability p = ${f(step.p)}, outside (0, 1): the no-arbitrage ` +
        `condition d < e^{(r−δ)Δt} < u fails (d = ${f(step.d)}, e^{(r−δ)Δt} = ${f(growth)}, u = ${f(step.u)}, ` +
        `Δt = ${f(input.dt)} years); use more steps`,
    );
  }
  return step;
}
