/** axe-core run in the page under test, for the accessibility and narrow-screen tests. */
import { createRequire } from 'node:module';
import { readFileSync } from 'node:fs';
import type { Page } from 'playwright-core';

const axeSource = readFileSync(createRequire(import.meta.url).resolve('axe-core/axe.min.js'), 'utf8');

interface Finding {
  rule: string;
  impact: string | null;
  where: string[];
}

/** axe-core's findings on the page as it is now: each rule broken, its impact and the first three elements. */
export async function axeFindings(page: Page): Promise<Finding[]> {
  if (!(await page.evaluate(() => 'axe' in window))) await page.addScriptTag({ content: axeSource });
  return page.evaluate(async () => {
    const axe = (
      window as unknown as {
        axe: { run: (context: Document, options: object) => Promise<{ violations: { id: string; impact: string | null; nodes: { target: string[] }[] }[] }> };
      }
    ).axe;
    const result = await axe.run(document, { resultTypes: ['violations'] });
    return result.violations.map((v) => ({ rule: v.id, impact: v.impact, where: v.nodes.slice(0, 3).map((n) => n.target.join(' ')) }));
  });
}
