/**
 * Compiles a model given directly as modes and switches (the advanced form). Each raw switch
 * is one right; a switch with several origin modes becomes one compiled switch per origin.
 */
import type { CompiledModel } from './compiled';
import { refuse } from './errors';
import type { ProjectModel } from './schema';
import { TODAY } from './window';

export function compileRaw(model: ProjectModel): CompiledModel {
  const modesIn = model.modes ?? [{ id: 'operating', scale: 1 }];
  const index = new Map<string, number>();
  modesIn.forEach((mode, k) => {
    if (index.has(mode.id)) refuse(`modes[${k}].id`, `must be unique, "${mode.id}" appears twice`);
    index.set(mode.id, k);
  });
  const lookup = (id: string, field: string) => {
    const k = index.get(id);
    if (k === undefined) refuse(field, `names mode "${id}", which is not in modes`);
    return k;
  };
  const start = model.start === undefined ? 0 : lookup(model.start, 'start');

  const rights: CompiledModel['rights'] = [];
  const switches: CompiledModel['switches'] = [];
  const seen = new Set<string>();
  (model.switches ?? []).forEach((sw, k) => {
    const field = `switches[${k}]`;
    if (seen.has(sw.id)) refuse(`${field}.id`, `must be unique, "${sw.id}" appears twice`);
    seen.add(sw.id);
    const to = lookup(sw.to, `${field}.to`);
    const right = rights.length;
    rights.push({ id: sw.id, kind: 'custom', field, primaryFrom: lookup(sw.from[0]!, `${field}.from[0]`) });
    sw.from.forEach((fromId, f) => {
      const from = lookup(fromId, `${field}.from[${f}]`);
      if (from === to) refuse(`${field}.from[${f}]`, `must differ from to ("${sw.to}"): a switch into the same mode does nothing`);
      switches.push({ right, from, to, cost: sw.cost, window: sw.window, field });
    });
  });

  const investment = model.investment ?? 0;
  return {
    modes: modesIn.map((m) => ({ id: m.id, scale: m.scale, flowPerYear: m.flowPerYear ?? 0, terminal: m.terminal ?? 0 })),
    switches,
    rights,
    start,
    staticPlan: { mode: start, enter: TODAY, outlays: [{ on: TODAY, cost: investment }] },
    staticInvestment: investment,
    upfront: investment,
  };
}
