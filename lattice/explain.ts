/**
 * Explains one node's value three equivalent ways (docs/engine.md §6): the risk-neutral
 * expectation, and the replicating position (Δ units of the project's value plus B in
 * risk-free debt) that pays the same one step on. On CRR and Tian the three agree to rounding;
 * on Jarrow–Rudd and Trigeorgis the tree's p is not the exact risk-neutral probability of its
 * own moves, and the difference (the drift correction the engine applies) is reported.
 */
import { prepareModel } from './check-model';
import { refuse } from './errors';
import { buildPlan } from './plan';
import { rollback } from './rollback';

export interface NodeRef {
  step: number;
  node: number;
  mode: string;
}

export interface NodeExplanation {
  step: number;
  node: number;
  mode: string;
  t: number;
  /** Project value at the node (before this step's payout). */
  underlying: number;
  /** Cash the project pays at the node in this mode (scale × payout) plus the mode's flow. */
  cashAtNode: number;
  /** Continuation value (what the mode is worth if no switch is made here). */
  continuation: number;
  /** Value after the exercise rule. */
  value: number;
  /** The right exercised here, or null when the mode continues. */
  decision: { right: string; to: string; worth: number } | null;
  /** Every switch open here, with what it would be worth (continuation of target − cost). */
  alternatives: { right: string; to: string; worth: number }[];
  /** Absent at the horizon, where there is no step on. */
  oneStep: {
    p: number;
    discount: number;
    up: { underlying: number; value: number };
    down: { underlying: number; value: number };
    /** e^{−rΔt}[p·W_u + (1 − p)·W_d] */
    expectation: number;
    /** Δ = (W_u − W_d)/(V_u − V_d) */
    delta: number;
    /** B = e^{−rΔt}(W_u − Δ·V_u) */
    bond: number;
    /** Δ·(V − payout) + B: what the replicating position costs at the node. */
    replicatingCost: number;
    /** continuation − cashAtNode − expectation: 0 to rounding on CRR and Tian. */
    driftCorrection: number;
  } | null;
}

export function explainNode(input: unknown, ref: NodeRef): NodeExplanation {
  const { model, compiled } = prepareModel(input);
  const plan = buildPlan(model, compiled);
  const { steps, dt } = plan;
  if (!Number.isInteger(ref.step) || ref.step < 0 || ref.step > steps) refuse('step', `must be a whole number from 0 to ${steps}, got ${ref.step}`);
  if (!Number.isInteger(ref.node) || ref.node < 0 || ref.node > ref.step) refuse('node', `must be a whole number from 0 to ${ref.step}, got ${ref.node}`);
  const m = compiled.modes.findIndex((mode) => mode.id === ref.mode);
  if (m < 0) refuse('mode', `must be one of ${compiled.modes.map((x) => JSON.stringify(x.id)).join(', ')}, got ${JSON.stringify(ref.mode)}`);

  const { step: i, node: j } = ref;
  const width = steps + 1;
  const capture = rollback(plan, { captureStep: i }).capture!;
  const ratio = plan.u / plan.d;
  const underlyingAt = (step: number, node: number) => plan.lowest[step]! * Math.pow(ratio, node);
  const closedForm = (mode: number, step: number, node: number) => plan.scale[mode]! * underlyingAt(step, node) + plan.fixed[mode * width + step]!;

  const V = underlyingAt(i, j);
  const continuation = closedForm(m, i, j) + capture.continuation[m]![j]!;
  const value = closedForm(m, i, j) + capture.value[m]![j]!;
  const mode = compiled.modes[m]!;
  const exPayout = i < steps ? plan.kept[i]! * V : V;
  const cashAtNode = i < steps ? mode.scale * (V - exPayout) + mode.flowPerYear * dt : closedForm(m, i, j);

  const alternatives = [...plan.byMode[m]!]
    .filter((s) => plan.open[s * width + i] === 1)
    .map((s) => ({
      right: compiled.rights[compiled.switches[s]!.right]!.id,
      to: compiled.modes[plan.to[s]!]!.id,
      worth: closedForm(m, i, j) + plan.deltaScale[s]! * V + plan.offset[s * width + i]! + capture.continuation[plan.to[s]!]![j]!,
    }));
  let decision: NodeExplanation['decision'] = null;
  for (const alt of alternatives) if (alt.worth > (decision?.worth ?? continuation)) decision = alt;

  let oneStep: NodeExplanation['oneStep'] = null;
  if (i < steps && capture.next) {
    const Vu = underlyingAt(i + 1, j + 1);
    const Vd = underlyingAt(i + 1, j);
    const Wu = closedForm(m, i + 1, j + 1) + capture.next[m]![j + 1]!;
    const Wd = closedForm(m, i + 1, j) + capture.next[m]![j]!;
    const expectation = plan.discount * (plan.p * Wu + (1 - plan.p) * Wd);
    const delta = (Wu - Wd) / (Vu - Vd);
    const bond = plan.discount * (Wu - delta * Vu);
    oneStep = {
      p: plan.p,
      discount: plan.discount,
      up: { underlying: Vu, value: Wu },
      down: { underlying: Vd, value: Wd },
      expectation,
      delta,
      bond,
      replicatingCost: delta * exPayout + bond,
      driftCorrection: continuation - (i < steps ? mode.scale * (V - exPayout) + mode.flowPerYear * dt : 0) - expectation,
    };
  }
  return { step: i, node: j, mode: ref.mode, t: i * dt, underlying: V, cashAtNode, continuation, value, decision, alternatives, oneStep };
}
