/**
 * Every page of the board pack, in both page sizes, for the demo plant and for a case built to
 * strain the layout (long names, ten years, long option names): pdftoppm renders each page, and
 * the words pdftotext finds, with their boxes, show that nothing runs into the footer, the footer's
 * two parts never overlap, each chart heading sits on its chart's page, no chart label was cut
 * short, and the approval record lists every event.
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, readdirSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { demoBoardPackData, demoPlant } from '@/demo/board-pack-data';
import type { BoardPackData, FollowThrough, PageSize } from '@/lib/board-pack/data';
import { renderBoardPack } from '@/lib/board-pack/render';

interface Word {
  text: string;
  xMin: number;
  yMin: number;
  xMax: number;
  yMax: number;
}
interface PdfPage {
  height: number;
  words: Word[];
}

/** The words of every page with their boxes (points, y from the top), as `pdftotext -bbox` reads them. */
function pages(file: string): PdfPage[] {
  const html = execFileSync('pdftotext', ['-bbox', file, '-']).toString();
  return html
    .split('<page ')
    .slice(1)
    .map((chunk) => ({
      height: Number(/height="([\d.]+)"/.exec(chunk)![1]),
      words: [...chunk.matchAll(/<word xMin="([\d.]+)" yMin="([\d.]+)" xMax="([\d.]+)" yMax="([\d.]+)">([^<]*)<\/word>/g)].map((m) => ({
        xMin: Number(m[1]),
        yMin: Number(m[2]),
        xMax: Number(m[3]),
        yMax: Number(m[4]),
        text: m[5]!
          .replace(/&amp;/g, '&')
          .replace(/&quot;/g, '"')
          .replace(/&#39;/g, "'"),
      })),
    }));
}

const pageText = (page: PdfPage) => page.words.map((w) => w.text).join(' ');
const pageOf = (all: PdfPage[], phrase: string) => all.findIndex((p) => pageText(p).includes(phrase));

// The layout's own numbers (lib/board-pack/document.tsx): the page's bottom padding and the footer's band.
const BOTTOM_PADDING = 64;

/** A case built to strain the layout: long names, ten years of cash flows, long option names (invented). */
function strained(pageSize: PageSize): BoardPackData {
  const { inputs } = demoPlant();
  const last = inputs.cashFlows.rows.at(-1)!;
  const rows = [...inputs.cashFlows.rows, ...[1, 2].map((k) => ({ ...last, year: last.year + k }))];
  const data = demoBoardPackData(pageSize, {
    projectName: 'Northern terminal expansion with a cold-chain platform for invented regional distributors',
    caseName: 'Downside demand scenario with delayed permits and a later second phase',
    inputs: {
      ...inputs,
      cashFlows: { ...inputs.cashFlows, rows },
      options: (inputs.options ?? []).map((o, k) => ({ ...o, id: `${o.id ?? `Option ${k + 1}`} under the framework agreement with the port`.slice(0, 64) })),
    },
  });
  // A later version's pack, with a long follow-through of the version approved before (invented).
  const followThrough: FollowThrough = {
    caseVersion: 2,
    approvedAt: '2025-03-01T10:00:00.000Z',
    observations: Array.from({ length: 14 }, (_, k) => ({
      date: k < 9 ? `2025-${String(k + 4).padStart(2, '0')}-15` : `2026-${String(k - 8).padStart(2, '0')}-15`,
      value: 150 + 3 * k,
      source: k % 2 ? 'updated DCF after the quarterly review of the framework agreement' : 'market comparables',
    })),
    decisions: [
      {
        date: '2025-06-02',
        right: 'Phase 2 under the framework agreement with the port',
        decision: 'postponed',
        reason: 'The second offtaker has not signed; the committee looks again after the summer, when the permit for the second berth is expected.',
        by: 'Priya Lindqvist',
      },
      {
        date: '2025-11-20',
        right: 'Phase 2 under the framework agreement with the port',
        decision: 'exercised',
        reason: 'Both offtakers signed; the board approved the second phase.',
        by: 'Priya Lindqvist',
      },
    ],
  };
  return { ...data, followThrough };
}

const cases: [string, (size: PageSize) => BoardPackData][] = [
  ['the demo plant', (size) => demoBoardPackData(size)],
  ['a strained case', strained],
];

describe.each(cases)('the board pack of %s', (_, build) => {
  it.each(['A4', 'LETTER'] as PageSize[])(
    'lays out every %s page cleanly',
    async (size) => {
      const data = build(size);
      const dir = mkdtempSync(path.join(tmpdir(), 'leeway-pages-'));
      const file = path.join(dir, 'pack.pdf');
      writeFileSync(file, await renderBoardPack(data));

      // Every page renders to an image.
      execFileSync('pdftoppm', ['-r', '30', '-png', file, path.join(dir, 'page')]);
      const images = readdirSync(dir).filter((f) => f.endsWith('.png'));
      const all = pages(file);
      expect(images).toHaveLength(all.length);
      for (const image of images) expect(statSync(path.join(dir, image)).size).toBeGreaterThan(1000);

      for (const [k, page] of all.entries()) {
        const footerTop = page.height - BOTTOM_PADDING;
        const body = page.words.filter((w) => w.yMin < footerTop);
        const footer = page.words.filter((w) => w.yMin >= footerTop);
        // Nothing of the body reaches into the footer's band.
        expect(body.filter((w) => w.yMax > footerTop + 1).map((w) => w.text)).toEqual([]);
        // The footer holds the page number, and no footer word overlaps another on its line.
        expect(footer.map((w) => w.text).join(' ')).toContain(`page ${k + 1} of ${all.length}`);
        for (const a of footer)
          for (const b of footer)
            if (a !== b && a.yMin < b.yMax && b.yMin < a.yMax) expect(a.xMax <= b.xMin + 0.5 || b.xMax <= a.xMin + 0.5, `${a.text} / ${b.text}`).toBe(true);
      }

      // Each chart heading is on the page of its chart.
      expect(pageOf(all, 'Sensitivity of the expanded NPV')).toBe(pageOf(all, 'Project value V0'));
      expect(pageOf(all, 'From static to expanded NPV')).toBe(pageOf(all, 'Together vs. alone'));
      expect(pageOf(all, 'Together vs. alone')).toBeGreaterThan(-1);
      // No label was cut short: Leeway never shortens text with an ellipsis in a pack.
      expect(all.map(pageText).join(' ')).not.toContain('…');

      // The approval record: every submission and what became of it.
      const text = all.map(pageText).join(' ');
      expect(text).toContain('Returned: “Justify the volatility before approval.”');
      expect(text).toContain('Withdrawn by the analyst');
      expect(text.match(/Submitted for review/g)).toHaveLength(3);
      // A later version's pack says how the version approved before was followed.
      if (data.followThrough) {
        expect(text).toContain('Follow-through of version 2');
        expect(text).toContain('Both offtakers signed;');
        expect(text).toContain(`recorded ${data.followThrough.observations.length} values`);
      } else expect(text).not.toContain('Follow-through');
    },
    60_000,
  );
});
