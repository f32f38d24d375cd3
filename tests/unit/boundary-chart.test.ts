/**
 * The boundary chart draws every decision the rules word: a right's first use and the decisions
 * it leads to (engine 4.2.0's followUps), one legend line each, the same sentences as Results.
 * Rendered on the server (no layout, the chart's fallback width).
 */
import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { BoundaryChart } from '@/components/charts/boundary-chart';
import { demoPortfolio } from '@/demo/portfolio';
import { valueProject } from '@/lattice';
import { caseToModel } from '@/lib/case-model';
import { decisionRule, ruleLines } from '@/lib/decision-rules';

const decode = (html: string) => html.replace(/&#x27;|&rsquo;/g, "'").replace(/&amp;/g, '&');

describe('the boundary chart', () => {
  it('draws and names a stage right’s later payments, not only its first', () => {
    const inputs = demoPortfolio.find((p) => p.name === 'Staged pilot line')!.cases[0]!;
    const { model } = caseToModel(inputs);
    const result = valueProject(model, { extras: false });
    const html = decode(
      renderToStaticMarkup(createElement(BoundaryChart, { rights: result.rights, v0: model.underlying.value, horizon: model.horizon, currency: 'EUR' })),
    );
    const lines = result.rights.flatMap((s) => ruleLines(decisionRule(s, 'EUR')));
    // The pilot pays now whatever happens, then twice more, each payment only above its critical value.
    expect(lines).toHaveLength(3);
    const legend = [...html.matchAll(/<li [^>]*><svg[^>]*>.*?<\/svg>(.*?)<\/li>/g)].map((m) => m[1]);
    expect(legend).toEqual(lines);
    // Each later payment is open at one date: a point each, none for the unconditional first.
    expect(html.match(/<circle /g)).toHaveLength(2);
  });

  it('following a case, puts the value at approval’s label at the right, clear of the observations that start at the left', () => {
    const inputs = demoPortfolio.find((p) => p.name === 'Phased bio-resin plant')!.cases[0]!;
    const { model } = caseToModel(inputs);
    const result = valueProject(model, { extras: false });
    const v0 = model.underlying.value;
    // Observed close to V0, as the demo's are: the line ran through "V at approval 154.0".
    const observed = [0.3, 0.8, 1.4, 1.9, 2.2].map((t, k) => ({ t, v: v0 * (1 + 0.02 * k) }));
    const html = decode(
      renderToStaticMarkup(
        createElement(BoundaryChart, { rights: result.rights, v0, horizon: model.horizon, currency: 'EUR', observed, v0Label: 'V at approval' }),
      ),
    );
    const label = html.match(/<text x="([\d.]+)" y="[\d.]+" text-anchor="end"[^>]*>V at approval/);
    expect(label).not.toBeNull();
    const lastObservation = Math.max(...[...html.matchAll(/<circle cx="([\d.]+)"/g)].map((m) => Number(m[1])));
    // The label ends at its x; at the charts' 12 px, "V at approval 154.0" is under 150 px wide.
    expect(Number(label![1]) - 150).toBeGreaterThan(lastObservation);
  });
});
