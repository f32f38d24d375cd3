/**
 * What the board pack and the validation report share: Work Sans registered from the files the
 * app ships, the page and table styles, a figures table, and the assumptions table.
 */
import path from 'node:path';
import { Font, Page, StyleSheet, Text, View } from '@react-pdf/renderer';
import type { ReactNode } from 'react';
import type { ProjectModel } from '@/lattice';
import { palette } from '@/lib/palette';
import { analyseCashFlows } from '../cash-flows';
import { formatMoney, formatPercent } from '../format';
import type { CaseInput } from '../validations/case';
import { pdfText } from './text';
import { treeLabels } from '../tree-words';
import { volatilitySourceText } from '../volatility/method-words';
import { timingLabels } from '../timing-words';

let fontsReady = false;

/** Work Sans from @fontsource/work-sans (react-pdf reads .woff, not .woff2); words are never hyphenated. */
export function registerFonts() {
  if (fontsReady) return;
  const file = (weight: number) =>
    path.join(/*turbopackIgnore: true*/ process.cwd(), 'node_modules', '@fontsource', 'work-sans', 'files', `work-sans-latin-${weight}-normal.woff`);
  Font.register({ family: 'Work Sans', fonts: [400, 500, 600, 700].map((fontWeight) => ({ src: file(fontWeight), fontWeight })) });
  // A board member should not read "expan-ded".
  Font.registerHyphenationCallback((word) => [word]);
  fontsReady = true;
}

/** The palette's colours as PDFs draw them. */
export const pdfColours = {
  ink: palette.ink.DEFAULT,
  soft: palette.ink.soft,
  muted: palette.ink.muted,
  line: palette.line.DEFAULT,
  tide: palette.tide[500],
  brick: palette.brick[500],
};
const { ink, soft, muted, line, tide } = pdfColours;

export const styles = StyleSheet.create({
  page: { fontFamily: 'Work Sans', fontSize: 10, color: ink, paddingTop: 48, paddingBottom: 64, paddingHorizontal: 48 },
  // Line height is set per paragraph, never on the page: on the page it drops the footer's page numbers (react-pdf 4.9).
  para: { fontSize: 10, lineHeight: 1.4 },
  // Four footer lines (the longest project and case names) fit between the page's bottom padding (64) and the footer's bottom (16).
  footer: { position: 'absolute', bottom: 16, left: 48, right: 48, fontSize: 8, color: muted, flexDirection: 'row', justifyContent: 'space-between' },
  eyebrow: { fontSize: 8, letterSpacing: 1, color: muted, textTransform: 'uppercase' },
  h1: { fontSize: 24, fontWeight: 600, marginTop: 6, marginBottom: 6, lineHeight: 1.2 },
  h2: { fontSize: 14, fontWeight: 600, marginBottom: 8, marginTop: 4 },
  h3: { fontSize: 11, fontWeight: 600, marginBottom: 4, marginTop: 10 },
  lead: { lineHeight: 1.4, fontSize: 11, color: soft, marginTop: 6 },
  tiles: { flexDirection: 'row', gap: 10, marginTop: 18 },
  tile: { flex: 1, borderWidth: 1, borderColor: line, borderRadius: 4, padding: 10 },
  tileStrong: { flex: 1, borderWidth: 1.5, borderColor: tide, borderRadius: 4, padding: 10, backgroundColor: palette.tide[50] },
  tileLabel: { fontSize: 8, color: muted, textTransform: 'uppercase', letterSpacing: 0.6 },
  tileValue: { fontSize: 16, fontWeight: 600, marginTop: 3 },
  caution: { lineHeight: 1.4, marginTop: 14, padding: 10, backgroundColor: palette.paper.sunk, fontSize: 8.5, color: soft, borderRadius: 3 },
  demo: { lineHeight: 1.4, marginTop: 10, padding: 6, backgroundColor: palette.ember[100], color: palette.ember[700], fontSize: 8.5, borderRadius: 3 },
  table: { borderWidth: 1, borderColor: line, borderRadius: 3, marginTop: 6 },
  row: { flexDirection: 'row', borderBottomWidth: 1, borderBottomColor: line },
  head: { backgroundColor: palette.paper.sunk },
  cell: { padding: 4, fontSize: 8.5 },
  num: { textAlign: 'right' },
  rule: { fontSize: 10, lineHeight: 1.4, marginBottom: 5, paddingLeft: 8, borderLeftWidth: 2, borderLeftColor: tide },
});

export const money = (value: number | null | undefined, currency?: string, digits = 1) => formatMoney(value, currency, digits);

/** A table whose columns after the first hold figures (right-aligned), unless `textColumns` says otherwise. */
export function Table({ columns, rows, widths, textColumns = [] }: { columns: string[]; rows: string[][]; widths: number[]; textColumns?: number[] }) {
  const numeric = (k: number) => k > 0 && !textColumns.includes(k);
  return (
    <View style={styles.table}>
      <View style={[styles.row, styles.head]}>
        {columns.map((c, k) => (
          <Text key={c} style={[styles.cell, { width: `${widths[k]}%`, fontWeight: 600 }, numeric(k) ? styles.num : {}]}>
            {c}
          </Text>
        ))}
      </View>
      {rows.map((r, i) => (
        <View key={i} style={[styles.row, i === rows.length - 1 ? { borderBottomWidth: 0 } : {}]} wrap={false}>
          {r.map((c, k) => (
            <Text key={k} style={[styles.cell, { width: `${widths[k]}%` }, numeric(k) ? styles.num : {}]}>
              {pdfText(c)}
            </Text>
          ))}
        </View>
      ))}
    </View>
  );
}

/** The valuation's assumptions, one row each, as both documents print them. */
export function assumptionRows(inputs: CaseInput, model: ProjectModel, currency: string): string[][] {
  const analysis = analyseCashFlows(inputs.cashFlows);
  return [
    ['Underlying value V0 (PV of operating cash flows)', money(analysis.underlyingValue, currency)],
    ['NPV at the WACC', money(analysis.npvAtWacc, currency)],
    ['WACC', formatPercent(inputs.cashFlows.wacc)],
    ['Cash-flow timing', timingLabels[inputs.cashFlows.timing ?? 'end-of-year']],
    ['Volatility of the project value', formatPercent(inputs.settings.volatility)],
    ['Where the volatility comes from', volatilitySourceText(inputs.settings.volatilitySource)],
    ['Risk-free rate (continuous)', formatPercent(inputs.settings.riskFreeRate, 2)],
    ['Lattice', `${treeLabels[inputs.settings.tree ?? 'crr']}, ${inputs.settings.steps} steps`],
    ['Horizon', `${model.horizon} years`],
  ];
}

/** A page's footer: what the document is about on the left (it wraps), the page count on the right. */
export function PageFooter({ about, document }: { about: string; document: string }) {
  return (
    <View style={styles.footer} fixed>
      {/* The left part takes what the page number leaves and wraps there: a long name never runs into it. */}
      <Text style={{ flex: 1, marginRight: 16 }}>{pdfText(about)}</Text>
      {/* A fixed width: react-pdf lays out a render-prop text before it knows its words. */}
      <Text style={{ width: 170, textAlign: 'right' }} render={({ pageNumber, totalPages }) => `Leeway ${document} · page ${pageNumber} of ${totalPages}`} />
    </View>
  );
}

/** A page that starts with a section title and ends with the document's footer. */
export function SectionPage({ size, title, footer, children }: { size: 'A4' | 'LETTER'; title: string; footer: ReactNode; children: ReactNode }) {
  return (
    <Page size={size} style={styles.page}>
      <Text style={styles.h2}>{title}</Text>
      {children}
      {footer}
    </Page>
  );
}
