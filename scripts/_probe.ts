import { valueProject, type ProjectModel } from '@/lattice';
import { prepareModel } from '@/lattice/check-model';
import { singlePass } from '@/lattice/single-pass';
import { caseToModel } from '@/lib/case-model';
import { demoPortfolio } from '@/demo/portfolio';
const models: { name: string; model: ProjectModel }[] = [];
for (const p of demoPortfolio) for (const c of p.cases) {
  const h = c.cashFlows.rows.at(-1)!.year;
  for (const perYear of [6, 12, 25]) models.push({ name: `${p.name}/${c.name}/${perYear}`, model: caseToModel({ ...c, settings: { ...c.settings, steps: perYear * h } }).model });
}
const npv = (m: ProjectModel, steps: number) => { const { model, compiled } = prepareModel({ ...m, steps }); return singlePass(model, compiled, { valueOnly: true }).expandedNpv; };
const rows: number[][] = [];
for (const { name, model } of models) {
  const N = model.steps; const h = model.horizon;
  const round = (n: number) => Math.max(h, Math.round(n / h) * h);
  const N2 = round(N / 2), N1 = round(N / 4);
  const vN = npv(model, N), v2 = npv(model, N2), v1 = npv(model, N1);
  const ref = npv(model, Math.round(5000 / h) * h);
  const ext = (N * vN - N2 * v2) / (N - N2);
  const e1 = Math.abs(vN - v2);
  const e3 = Math.max(Math.abs(vN - v2) * N2 / (N - N2), Math.abs(v2 - v1) * N1 / (N - N1));
  rows.push([e1, e3, Math.abs(ref - vN), Math.abs(ref - ext)]);
  console.log(name.padEnd(50), N, vN.toFixed(3), ref.toFixed(3), 'err', Math.abs(ref - vN).toFixed(3), 'e1', e1.toFixed(3), 'e3', e3.toFixed(3), 'ext err', Math.abs(ref-ext).toFixed(3));
}
for (const k of [1, 1.5, 2, 3]) {
  console.log('k', k, 'cover e1', rows.filter((r) => r[2]! <= k * r[0]!).length, 'cover e3', rows.filter((r) => r[2]! <= k * r[1]!).length, 'of', rows.length);
}
