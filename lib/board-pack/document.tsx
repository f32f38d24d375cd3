/**
 * The board pack, drawn with @react-pdf/renderer: cover and recommendation, NPV with and without
 * flexibility, decision rules, an excerpt of the lattice, the rights' values and their interactions,
 * sensitivities, assumptions, methodology and limitations with the cautions, and the approval
 * record. Charts are vector drawings laid out by the same functions as the web charts
 * (lib/charts/*). Everything comes from the approved snapshot, so the same snapshot always gives
 * the same document.
 */
import { Circle, Document, G, Line, Page, Rect, Svg, Text, View } from '@react-pdf/renderer';
import type { ReactNode } from 'react';
import type { Sensitivity, ValuationResult } from '@/lattice';
import { VALUATION_CAUTION } from '@/lib/caution';
import { analyseCashFlows } from '../cash-flows';
import { layoutLatticeTree } from '../charts/lattice-tree';
import { layoutNpvComparison } from '../charts/npv-comparison';
import { layoutTornado } from '../charts/tornado';
import { layoutWaterfall, waterfallLabels, waterfallSteps } from '../charts/waterfall';
import { textWidth, wrapLabel } from '../charts/wrap-label';
import { decisionRule, ruleInFull } from '../decision-rules';
import { readingOfFigures } from '../figures-reading';
import { formatChange, formatDateTime, formatPercent } from '../format';
import { nameWithKind } from '../option-form';
import { premiumSplitText } from '../premium-split';
import { describeRights } from '../option-words';
import type { BoardPackData, FollowThrough, RecordEvent } from './data';
import { pdfText } from './text';
import { palette, seriesFill } from '@/lib/palette';
import { assumptionRows, money, PageFooter, pdfColours, SectionPage, styles, Table } from './pdf-parts';
import { treeLabels } from '../tree-words';
import { warningSentence } from '../warning-words';

const { ink, soft, muted, tide, brick } = pdfColours;

/** Chart label size (pt), and the tornado's label column, in which long labels wrap. */
const LABEL_SIZE = 7.5;
const LABEL_COLUMN = 150;
const NPV_LABEL_COLUMN = 90;
const WATERFALL_LABEL_LINES = 5;
/** The longest decision name a lattice node shows whole; a longer one is keyed to a line under the diagram. */
const NODE_LABEL_CHARS = 15;

function Footer({ data }: { data: BoardPackData }) {
  const about = `${data.project.name} · ${data.snapshot.caseName} · approved ${formatDateTime(data.snapshot.decidedAt)}${data.isDemo ? ' · invented demo figures' : ''}`;
  return <PageFooter about={about} document="board pack" />;
}

function Section({ data, title, children }: { data: BoardPackData; title: string; children: ReactNode }) {
  return (
    <SectionPage size={data.pageSize} title={title} footer={<Footer data={data} />}>
      {children}
    </SectionPage>
  );
}

function SvgText({
  x,
  y,
  children,
  anchor = 'start',
  size = LABEL_SIZE,
  color = soft,
  bold = false,
}: {
  x: number;
  y: number;
  children: string;
  anchor?: 'start' | 'middle' | 'end';
  size?: number;
  color?: string;
  bold?: boolean;
}) {
  return (
    <Text x={x} y={y} fill={color} textAnchor={anchor} style={{ fontSize: size, fontFamily: 'Work Sans', fontWeight: bold ? 600 : 400 }}>
      {pdfText(children)}
    </Text>
  );
}

/** A horizontal value axis: a light line and a label at each tick (lib/charts/axis.ts placed and labelled them). */
function ValueAxis({ layout }: { layout: { ticks: { value: number; x: number; label: string }[]; margin: { top: number; bottom: number }; height: number } }) {
  return (
    <>
      {layout.ticks.map((t) => (
        <G key={t.value}>
          <Line x1={t.x} x2={t.x} y1={layout.margin.top} y2={layout.height - layout.margin.bottom} stroke={palette.paper.sunk} strokeWidth={1} />
          <SvgText x={t.x} y={layout.height - layout.margin.bottom + 12} anchor="middle" color={muted}>
            {t.label}
          </SvgText>
        </G>
      ))}
    </>
  );
}

function NpvChart({ data, width }: { data: BoardPackData; width: number }) {
  const r = data.snapshot.result;
  // One row, the approved case, whose name heads the page: a short label that always fits.
  const layout = layoutNpvComparison([{ id: 'case', label: 'This case', staticNpv: r.staticNpv, expandedNpv: r.expandedNpv }], width, {
    rowHeight: 56,
    labelWidth: NPV_LABEL_COLUMN,
  });
  const row = layout.rows[0]!;
  return (
    <Svg width={layout.width} height={layout.height}>
      <ValueAxis layout={layout} />
      <Line
        x1={layout.zeroX}
        x2={layout.zeroX}
        y1={layout.margin.top}
        y2={layout.height - layout.margin.bottom}
        stroke={muted}
        strokeWidth={1}
        strokeDasharray="3 3"
      />
      {wrapLabel(row.label, NPV_LABEL_COLUMN - 12, 8.5, 3).map((text, k, lines) => (
        <SvgText key={k} x={layout.margin.left - 8} y={row.y + 3 + (k - (lines.length - 1) / 2) * 10.5} anchor="end" color={ink} size={8.5}>
          {text}
        </SvgText>
      ))}
      <Line x1={row.staticX} x2={row.expandedX} y1={row.y} y2={row.y} stroke={palette.tide[300]} strokeWidth={6} />
      <Circle cx={row.staticX} cy={row.y} r={5} fill={palette.paper.raised} stroke={soft} strokeWidth={1.5} />
      <Circle cx={row.expandedX} cy={row.y} r={5.5} fill={tide} />
      <SvgText x={row.staticX} y={row.y - 10} anchor="middle">{`static ${money(r.staticNpv)}`}</SvgText>
      <SvgText x={row.expandedX} y={row.y + 17} anchor="middle" color={tide} bold>
        {`expanded ${money(r.expandedNpv)}`}
      </SvgText>
    </Svg>
  );
}

function WaterfallPdf({ data, width }: { data: BoardPackData; width: number }) {
  // Up to five lines of label under each bar: a right's name (at most 64 characters) fits whole.
  const layout = layoutWaterfall(waterfallSteps(data.snapshot.result), width, 240, 12 + WATERFALL_LABEL_LINES * (LABEL_SIZE + 2));
  const labels = waterfallLabels(layout.bars, LABEL_SIZE, WATERFALL_LABEL_LINES);
  return (
    <>
      <Svg width={layout.width} height={layout.height}>
        {layout.ticks.map((t) => (
          <G key={t.value}>
            <Line x1={layout.margin.left} x2={layout.width - layout.margin.right} y1={t.y} y2={t.y} stroke={palette.paper.sunk} strokeWidth={1} />
            <SvgText x={layout.margin.left - 6} y={t.y + 3} anchor="end" color={muted}>
              {t.label}
            </SvgText>
          </G>
        ))}
        <Line x1={layout.margin.left} x2={layout.width - layout.margin.right} y1={layout.zeroY} y2={layout.zeroY} stroke={muted} strokeWidth={1} />
        {layout.bars.map((b, n) => (
          <G key={b.key}>
            <Rect x={b.x} y={b.y} width={b.width} height={b.height} fill={b.kind === 'total' ? ink : b.value >= 0 ? tide : brick} />
            <SvgText x={b.center} y={b.y - 4} anchor="middle" color={ink} bold>
              {b.kind === 'total' ? money(b.value) : formatChange(b.value)}
            </SvgText>
            {labels.lines[n]!.map((text, k) => (
              <SvgText key={k} x={b.center} y={layout.height - layout.margin.bottom + 12 + k * (LABEL_SIZE + 2)} anchor="middle">
                {text}
              </SvgText>
            ))}
          </G>
        ))}
      </Svg>
      {labels.key ? (
        <Text style={{ fontSize: LABEL_SIZE, color: soft, lineHeight: 1.4 }}>{labels.key.map((k) => `${k.mark} ${k.label}`).join('   ·   ')}</Text>
      ) : null}
    </>
  );
}

function TornadoPdf({ data, width }: { data: BoardPackData; width: number }) {
  const r = data.snapshot.result;
  if (!r.sensitivities) return null;
  const figures = (s: Sensitivity) => `${money(s.low.expandedNpv)} / ${money(s.high.expandedNpv)}`;
  const rightWidth = Math.max(...r.sensitivities.map((s) => textWidth(figures(s), LABEL_SIZE))) + 8;
  const layout = layoutTornado(r.sensitivities, r.expandedNpv, width, { labelWidth: LABEL_COLUMN, rightWidth });
  return (
    <Svg width={layout.width} height={layout.height}>
      <ValueAxis layout={layout} />
      {layout.rows.map((row) => {
        const s = row.sensitivity;
        const bar = (x: number | null, fill: string) =>
          x === null ? null : (
            <Rect x={Math.min(x, layout.baseX)} y={row.y} width={Math.max(1, Math.abs(x - layout.baseX))} height={row.bandHeight} fill={fill} />
          );
        return (
          <G key={s.parameter}>
            {wrapLabel(s.label, LABEL_COLUMN - 12, LABEL_SIZE, 3).map((text, k, lines) => (
              <SvgText
                key={k}
                x={layout.margin.left - 8}
                y={row.y + row.bandHeight / 2 + 3 + (k - (lines.length - 1) / 2) * (LABEL_SIZE + 2)}
                anchor="end"
                color={ink}
              >
                {text}
              </SvgText>
            ))}
            {bar(row.lowX, palette.line.strong)}
            {bar(row.highX, tide)}
            <SvgText x={layout.width - layout.margin.right + 4} y={row.y + row.bandHeight / 2 + 3}>
              {figures(s)}
            </SvgText>
          </G>
        );
      })}
      <Line x1={layout.baseX} x2={layout.baseX} y1={layout.margin.top} y2={layout.height - layout.margin.bottom} stroke={ink} strokeWidth={1.2} />
    </Svg>
  );
}

const eventWords: Record<RecordEvent['kind'], string> = {
  submitted: 'Submitted for review',
  returned: 'Returned',
  withdrawn: 'Withdrawn by the analyst',
  approved: 'Approved',
};

function recordRow(event: RecordEvent): string[] {
  const what = event.reason ? `${eventWords[event.kind]}: “${event.reason}”` : eventWords[event.kind];
  return [what, `v${event.caseVersion}`, event.by, formatDateTime(event.at)];
}

/** A convergence point's expanded NPV; results stored by engine 1.x kept the lattice value instead. */
function convergedNpv(p: { steps: number; expandedNpv?: number; value?: number }, r: ValuationResult): number {
  return p.expandedNpv ?? p.value! - (r.value - r.expandedNpv);
}

function LatticePdf({ data, width }: { data: BoardPackData; width: number }) {
  if (!data.excerpt) return null;
  // The excerpt follows the mode the project starts in, as the app's lattice view does.
  const { grid, startMode } = data.excerpt;
  const layout = layoutLatticeTree(grid, startMode, Math.min(4, grid.steps.length - 1));
  const scale = Math.min(1, width / layout.width);
  const fills = seriesFill;
  const diagram = (
    <Svg width={layout.width * scale} height={layout.height * scale} viewBox={`0 0 ${layout.width} ${layout.height}`}>
      {layout.edges.map((e) => (
        <Line
          key={`${e.from.step}:${e.from.node}-${e.to.node}`}
          x1={e.from.x + 112}
          y1={e.from.y}
          x2={e.to.x}
          y2={e.to.y}
          stroke={palette.line.strong}
          strokeWidth={1}
        />
      ))}
      {layout.nodes.map((n) => (
        <G key={`${n.step}:${n.node}`}>
          <Rect
            x={n.x}
            y={n.y - 26}
            width={112}
            height={52}
            rx={5}
            fill={n.decision ? fills[layout.decisions.indexOf(n.decision) % fills.length] : palette.paper.raised}
            stroke={palette.line.strong}
            strokeWidth={1}
          />
          <SvgText x={n.x + 8} y={n.y - 10} size={10}>{`V ${money(n.underlying)}`}</SvgText>
          <SvgText x={n.x + 8} y={n.y + 5} size={11} color={ink} bold>{`W ${money(n.value)}`}</SvgText>
          <SvgText x={n.x + 8} y={n.y + 19} size={9}>
            {n.decision ? `> ${n.decision.length > NODE_LABEL_CHARS ? `(${layout.decisions.indexOf(n.decision) + 1})` : n.decision}` : 'continue'}
          </SvgText>
        </G>
      ))}
    </Svg>
  );
  const keyed = layout.decisions.map((d, k) => ({ d, k })).filter(({ d }) => d.length > NODE_LABEL_CHARS);
  return (
    <View>
      {diagram}
      {keyed.map(({ d, k }) => (
        <Text key={d} style={{ fontSize: 8.5, lineHeight: 1.4, color: soft }}>
          {pdfText(`(${k + 1}) ${d}`)}
        </Text>
      ))}
    </View>
  );
}

const decisionWords: Record<string, string> = { exercised: 'Exercised', declined: 'Declined', postponed: 'Postponed' };

/** How the version approved before this one was followed: the values recorded and the decisions on its rights. */
function FollowThroughSection({ data, followThrough: f }: { data: BoardPackData; followThrough: FollowThrough }) {
  const currency = data.project.currency;
  return (
    <Section data={data} title={`Follow-through of version ${f.caseVersion}`}>
      <Text style={styles.para}>
        {pdfText(
          `Version ${f.caseVersion} was approved on ${formatDateTime(f.approvedAt)}. Until this version was submitted, the team recorded ${f.observations.length} value${f.observations.length === 1 ? '' : 's'} of the project and ${f.decisions.length} decision${f.decisions.length === 1 ? '' : 's'} on its rights.`,
        )}
      </Text>
      <Text style={styles.h3}>Decisions on the rights</Text>
      {f.decisions.length === 0 ? (
        <Text style={styles.para}>None recorded.</Text>
      ) : (
        <Table
          columns={['Date', 'Right', 'Decision', 'Reason', 'By']}
          widths={[13, 17, 12, 40, 18]}
          textColumns={[1, 2, 3, 4]}
          rows={f.decisions.map((d) => [d.date, d.right, decisionWords[d.decision] ?? d.decision, d.reason, d.by])}
        />
      )}
      <Text style={styles.h3}>Values recorded</Text>
      {f.observations.length === 0 ? (
        <Text style={styles.para}>None recorded.</Text>
      ) : (
        <Table
          columns={['Date', 'Project value', 'Source']}
          widths={[20, 25, 55]}
          textColumns={[2]}
          rows={f.observations.map((o) => [o.date, money(o.value, currency), o.source || '–'])}
        />
      )}
      <Text style={styles.caution}>{pdfText(VALUATION_CAUTION)}</Text>
    </Section>
  );
}

export function BoardPackDocument({ data }: { data: BoardPackData }) {
  const { project, snapshot } = data;
  const r = snapshot.result;
  const currency = project.currency;
  const contentWidth = (data.pageSize === 'A4' ? 595.28 : 612) - 96;
  const rec = readingOfFigures(r, currency);
  const rules = r.rights.map((s) => decisionRule(s, currency));
  const analysis = analyseCashFlows(snapshot.inputs.cashFlows);
  const rows = snapshot.inputs.cashFlows.rows;
  const options = snapshot.inputs.options ?? [];
  return (
    <Document
      title={pdfText(`${project.name} – ${snapshot.caseName}: board pack`)}
      author="Leeway"
      subject="Real-options valuation of a capital project"
      creator="Leeway"
      producer="Leeway"
      creationDate={new Date(snapshot.decidedAt)}
      modificationDate={new Date(snapshot.decidedAt)}
    >
      <Page size={data.pageSize} style={styles.page}>
        <Text style={styles.eyebrow}>{pdfText(`${data.organisation} · board pack`)}</Text>
        <Text style={styles.h1}>{pdfText(project.name)}</Text>
        <Text style={styles.lead}>{pdfText(`${snapshot.caseName} (version ${snapshot.caseVersion}), approved ${formatDateTime(snapshot.decidedAt)}`)}</Text>
        {project.description ? <Text style={[styles.lead, { fontSize: 10 }]}>{pdfText(project.description)}</Text> : null}
        {data.isDemo ? <Text style={styles.demo}>Demo organisation: the company, the project and every figure in this pack are invented.</Text> : null}
        <View style={styles.tiles}>
          <View style={styles.tile}>
            <Text style={styles.tileLabel}>Static NPV</Text>
            <Text style={styles.tileValue}>{money(r.staticNpv, currency)}</Text>
          </View>
          <View style={styles.tile}>
            <Text style={styles.tileLabel}>Option premium</Text>
            <Text style={styles.tileValue}>{money(r.optionPremium, currency)}</Text>
          </View>
          <View style={styles.tileStrong}>
            <Text style={styles.tileLabel}>Expanded NPV</Text>
            <Text style={styles.tileValue}>{money(r.expandedNpv, currency)}</Text>
          </View>
        </View>
        {premiumSplitText(r, currency) ? (
          <Text style={{ fontSize: 10, lineHeight: 1.4, marginTop: 8, marginBottom: 6 }}>{pdfText(premiumSplitText(r, currency)!)}</Text>
        ) : null}
        <Text style={styles.h3}>Recommendation</Text>
        {snapshot.recommendation ? (
          <>
            <Text style={{ fontSize: 10, lineHeight: 1.4 }}>{pdfText(snapshot.recommendation)}</Text>
            <Text style={{ fontSize: 8.5, lineHeight: 1.4, color: muted, marginTop: 2 }}>
              {pdfText(`Written by ${snapshot.submittedBy} when submitting version ${snapshot.caseVersion}.`)}
            </Text>
          </>
        ) : (
          <Text style={{ fontSize: 10, lineHeight: 1.4, color: soft }}>
            No recommendation was written when this version was submitted (it predates written recommendations).
          </Text>
        )}
        {/* Leeway's own reading is labelled as such: it is a suggestion, never the recommendation. */}
        <Text style={{ fontSize: 8.5, lineHeight: 1.4, color: soft, marginTop: 6 }}>
          {pdfText(`Leeway's reading of the figures (generated, for reference): ${rec.headline} ${rec.body}`)}
        </Text>
        <View wrap={false}>
          <Text style={styles.h3}>NPV with and without flexibility</Text>
          <NpvChart data={data} width={contentWidth} />
        </View>
        <Text style={styles.h3}>Decision rules</Text>
        {rules.length === 0 ? <Text style={styles.para}>The case holds no rights: it is a now-or-never commitment.</Text> : null}
        {rules.map((rule) => (
          <Text key={rule.right} style={styles.rule}>
            {pdfText(ruleInFull(rule))}
          </Text>
        ))}
        <Text style={styles.caution}>{pdfText(VALUATION_CAUTION)}</Text>
        <Footer data={data} />
      </Page>

      <Section data={data} title="Rights: their values and interactions">
        <Text style={{ fontSize: 10, lineHeight: 1.4, color: soft, marginBottom: 6 }}>
          Stand-alone: the right alone on the project. Incremental: what it adds to all the others. The interaction is what the rights are worth together beyond
          the sum of their stand-alone values (negative when they substitute). Probabilities are risk-neutral.
        </Text>
        <Table
          columns={['Right', 'Stand-alone', 'Incremental', 'Ever exercised']}
          widths={[46, 18, 18, 18]}
          rows={[
            ...r.rights.map((s) => [
              nameWithKind(s.id, s.kind),
              money(s.standalone, currency),
              money(s.incremental, currency),
              formatPercent(s.exerciseProbability),
            ]),
            ...(r.interaction !== null && r.interaction !== undefined ? [['Interaction (together vs. alone)', money(r.interaction, currency), '', '']] : []),
          ]}
        />
        {/* A heading and its chart stay on one page: a block that does not fit starts the next one. */}
        <View wrap={false}>
          <Text style={styles.h3}>From static to expanded NPV ({currency}; the bars add up exactly before their labels are rounded)</Text>
          <WaterfallPdf data={data} width={contentWidth} />
        </View>
        <View wrap={false}>
          <Text style={styles.h3}>Sensitivity of the expanded NPV ({currency})</Text>
          <Text style={{ lineHeight: 1.4, color: soft, fontSize: 8.5 }}>
            Each input moved on its own, both ways: V0 and volatility by 10 % down (grey) and up (teal), the risk-free rate by one point, the payout schedule
            and each right&apos;s money by 10 %. Figures: expanded NPV when moved down / up; the vertical line is the valued expanded NPV,{' '}
            {money(r.expandedNpv, currency)}.
          </Text>
          <TornadoPdf data={data} width={contentWidth} />
        </View>
      </Section>

      <Section data={data} title="The lattice">
        <Text style={{ fontSize: 10, lineHeight: 1.4, color: soft }}>
          {pdfText(
            `A ${treeLabels[r.tree.kind]} binomial lattice of ${r.tree.steps} steps over ${snapshot.model.horizon} years (step ${r.tree.dt.toFixed(4)} years; up ${r.tree.u.toFixed(4)}, down ${r.tree.d.toFixed(4)}, risk-neutral probability ${r.tree.p.toFixed(4)}). The excerpt shows its first steps from today: V is the project's value, W its value with every right, and the label the decision taken at the node.`,
          )}
        </Text>
        <View style={{ marginTop: 10 }}>
          <LatticePdf data={data} width={contentWidth} />
        </View>
        {r.convergence ? (
          <Text style={{ fontSize: 10, lineHeight: 1.4, marginTop: 10, color: soft }}>
            {pdfText(
              `Convergence: expanded NPV ${r.convergence.points.map((p) => `${money(convergedNpv(p, r), currency, 2)} at ${p.steps} steps`).join(', ')}${r.convergence.band ? `; lattice error band ${money(r.convergence.band.low, currency, 2)} to ${money(r.convergence.band.high, currency, 2)}` : ''}.`,
            )}
          </Text>
        ) : null}
        {/* Results shows these beside the figures; a committee reading the pack sees them too. */}
        {r.warnings.length > 0 ? (
          <View style={{ marginTop: 10 }}>
            <Text style={styles.h3}>The engine&apos;s warnings</Text>
            {r.warnings.map((w, k) => (
              <Text key={k} style={{ fontSize: 10, lineHeight: 1.4, color: soft }}>
                {pdfText(`• ${warningSentence(w)}`)}
              </Text>
            ))}
          </View>
        ) : null}
      </Section>

      <Section data={data} title="Assumptions">
        <Table columns={['Assumption', 'Value']} widths={[60, 40]} rows={assumptionRows(snapshot.inputs, snapshot.model, currency)} />
        <Text style={styles.h3}>Cash flows ({currency})</Text>
        <Table
          columns={['Year', 'Revenue', 'Operating cost', 'Tax', 'Working capital', 'Capex', 'Free cash flow']}
          widths={[10, 15, 15, 15, 15, 15, 15]}
          rows={rows.map((row, k) => [
            String(row.year),
            money(row.revenue),
            money(row.operatingCost),
            money(row.tax),
            money(row.workingCapital),
            money(row.capex),
            money(analysis.rows[k]?.freeCashFlow),
          ])}
        />
        <Text style={styles.h3}>Terms of the rights</Text>
        {options.length === 0 ? <Text style={styles.para}>None.</Text> : null}
        {describeRights(options, currency).map((r) => (
          <Text key={r.id} style={{ marginBottom: 3 }}>
            {pdfText(`${r.id}: ${r.terms}`)}
          </Text>
        ))}
      </Section>

      {data.followThrough ? <FollowThroughSection data={data} followThrough={data.followThrough} /> : null}

      <Section data={data} title="Methodology, limitations and approval">
        <Text style={styles.para}>
          The project&apos;s value is modelled as a lognormal process on a recombining binomial lattice under the risk-neutral measure; the rights management
          holds are valued together by backward induction, so their interactions are captured (their values are not additive). The underlying value is the
          present value of the operating cash flows at the WACC; the cash it pays out each year lowers it along the lattice. Volatility is the annualised
          volatility of the project&apos;s value returns.
        </Text>
        <Text style={styles.h3}>Limitations</Text>
        <Text style={styles.para}>
          The results rest on the stated assumptions: a lognormal value with constant volatility, a traded-twin or consolidated-uncertainty argument for
          risk-neutral valuation, the chosen discount and risk-free rates, and decisions taken as the rules say. Exercise probabilities are risk-neutral, not
          forecasts. The lattice is a discrete approximation (see the convergence note).
        </Text>
        <Text style={styles.caution}>{pdfText(VALUATION_CAUTION)}</Text>
        <Text style={styles.h3}>Approval record</Text>
        <Text style={{ fontSize: 8.5, lineHeight: 1.4, color: soft }}>Every submission of this case up to this approval, and what became of it.</Text>
        <Table columns={['Event', 'Version', 'By', 'When']} widths={[46, 10, 22, 22]} rows={data.record.map(recordRow)} />
        <Text style={{ lineHeight: 1.4, marginTop: 8, fontSize: 8, color: muted }}>
          {pdfText(
            `Snapshot ${snapshot.id} of case version ${snapshot.caseVersion}; engine ${snapshot.engineVersion}; input fingerprint (SHA-256) ${snapshot.inputHash}.`,
          )}
        </Text>
      </Section>
    </Document>
  );
}
