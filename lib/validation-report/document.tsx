/**
 * The validation report, drawn with the board pack's renderer and parts (../board-pack/pdf-parts):
 * what a model-validation reviewer asks of a valuation model (conceptual soundness, inputs and
 * their sources, convergence, benchmarking against an independent method and published values)
 * for one saved version of a case. Every figure comes from ./data.ts; nothing here computes one.
 */
import { Document, Page, Text, View } from '@react-pdf/renderer';
import type { ReactNode } from 'react';
import { VALUATION_CAUTION } from '@/lib/caution';
import { pdfText } from '../board-pack/text';
import { assumptionRows, money, PageFooter, pdfColours, SectionPage, styles, Table } from '../board-pack/pdf-parts';
import { formatDateTime, formatNumber, formatPercent } from '../format';
import { describeRights } from '../option-words';
import { describeSnaps } from '../snap-words';
import { premiumSplitText } from '../premium-split';
import { volatilityMethodLabels } from '../volatility/method-words';
import { treeLabels } from '../tree-words';
import type { ValidationReportData } from './data';
import { warningSentence } from '../warning-words';

function Footer({ data }: { data: ValidationReportData }) {
  const about = `${data.project.name} · ${data.caseName} · version ${data.caseVersion} · ${formatDateTime(data.generatedAt)}${data.isDemo ? ' · invented demo figures' : ''}`;
  return <PageFooter about={about} document="validation report" />;
}

function Section({ data, title, children }: { data: ValidationReportData; title: string; children: ReactNode }) {
  return (
    <SectionPage size={data.pageSize} title={title} footer={<Footer data={data} />}>
      {children}
    </SectionPage>
  );
}

const Para = ({ children }: { children: string }) => <Text style={[styles.para, { marginTop: 6 }]}>{pdfText(children)}</Text>;

/** The conventions of this model in plain words, read from the model itself. */
function conventions(data: ValidationReportData): string[] {
  const { model, inputs, result } = data;
  const settings = inputs.settings;
  const periods = model.underlying.payoutPeriods?.length ?? 0;
  return [
    `The project's gross value V is the present value at the WACC (${formatPercent(inputs.cashFlows.wacc)}) of its operating cash flows, ${money(model.underlying.value, data.project.currency, 2)} today. It is modelled as a lognormal process (a geometric Brownian motion under the risk-neutral measure) with a constant volatility of ${formatPercent(settings.volatility)} a year.`,
    `The rights are valued by risk-neutral backward induction on a ${treeLabels[result.tree.kind]} binomial lattice of ${result.tree.steps} steps of ${formatNumber(result.tree.dt, 4)} years (u = ${formatNumber(result.tree.u, 4)}, d = ${formatNumber(result.tree.d, 4)}, p = ${formatNumber(result.tree.p, 4)}), discounted at the continuous risk-free rate of ${formatPercent(settings.riskFreeRate, 2)}. The WACC only builds V; the rights are discounted at the risk-free rate.`,
    periods > 0
      ? `Payouts: the cash of each of the ${periods} years is earned during its year, as a constant yield that leaves exactly the year's remaining share of V at its end. A decision on any date sees the value after the cash already earned, and the way the project is run during a step receives that step's cash.`
      : 'Payouts: none; V grows at the risk-free rate under the risk-neutral measure.',
    `Horizon: ${model.horizon} years, the schedule's last year; nothing is worth anything after it. The static plan's outlay is the present value of the capital expenditure${model.investment === undefined ? ', carried by the defer or stage right' : ''}.`,
    describeSnaps(
      result.snaps,
      result.rights.map((r) => r.id),
    ) ?? "Every decision date falls on the lattice's steps.",
    'Rights are used at most once (a reversible switch may go back and forth); scale effects add; salvage follows the scale sold unless a fixed amount is stated; a stage payment skipped ends the project. Exercise probabilities are risk-neutral, not forecasts.',
  ];
}

export function ValidationReportDocument({ data }: { data: ValidationReportData }) {
  const { result, project, inputs, crossCheck, references } = data;
  const currency = project.currency;
  const m = (x: number | null | undefined, digits = 2) => money(x, currency, digits);
  const source = inputs.settings.volatilitySource;
  const convergence = result.convergence;
  const passing = references?.checks.filter((c) => c.passes).length ?? 0;
  return (
    <Document title={pdfText(`${project.name} – ${data.caseName}: validation report`)} author="Leeway" creator="Leeway" producer="Leeway">
      <Page size={data.pageSize} style={styles.page}>
        <Text style={styles.eyebrow}>{pdfText(`${data.organisation} · validation report`)}</Text>
        <Text style={styles.h1}>{pdfText(`${project.name}: ${data.caseName}`)}</Text>
        <Text style={styles.lead}>
          {pdfText(
            `Version ${data.caseVersion}, valued ${formatDateTime(data.generatedAt)} by ${result.engineVersion}. What a model-validation review asks of this valuation: its conventions, its inputs and their sources, how far the lattice is from its limit, what is plan and what is option, how it moves, whether an independent method agrees, and what the engine reproduces of published values.`,
          )}
        </Text>
        {data.isDemo ? <Text style={styles.demo}>Demo organisation: every figure in this report is invented.</Text> : null}
        <View style={styles.tiles}>
          <View style={styles.tileStrong}>
            <Text style={styles.tileLabel}>Expanded NPV</Text>
            <Text style={styles.tileValue}>{m(result.expandedNpv)}</Text>
          </View>
          <View style={styles.tile}>
            <Text style={styles.tileLabel}>Convergence band</Text>
            <Text style={styles.tileValue}>{convergence?.band ? `± ${m((convergence.band.high - convergence.band.low) / 2)}` : 'n/a'}</Text>
          </View>
          <View style={styles.tile}>
            <Text style={styles.tileLabel}>Cross-check</Text>
            <Text style={styles.tileValue}>{crossCheck ? (crossCheck.result.verdict.agrees ? 'Agrees' : 'Disagrees') : 'Not run'}</Text>
          </View>
          <View style={styles.tile}>
            <Text style={styles.tileLabel}>Published checks</Text>
            <Text style={styles.tileValue}>{references ? `${passing} of ${references.checks.length}` : 'n/a'}</Text>
          </View>
        </View>
        <Text style={styles.caution}>{pdfText(VALUATION_CAUTION)}</Text>
        <Text style={{ lineHeight: 1.4, marginTop: 10, fontSize: 8, color: pdfColours.muted }}>
          {pdfText(`Input fingerprint (SHA-256) ${data.inputHash}; result hash ${data.resultHash}.`)}
        </Text>
        <Footer data={data} />
      </Page>

      <Section data={data} title="The model and its conventions">
        {conventions(data).map((text, k) => (
          <Para key={k}>{text}</Para>
        ))}
      </Section>

      <Section data={data} title="Inputs and their sources">
        <Table columns={['Input', 'Value']} widths={[60, 40]} textColumns={[1]} rows={assumptionRows(inputs, data.model, currency)} />
        <Text style={styles.h3}>Volatility</Text>
        <Para>
          {source
            ? `${volatilityMethodLabels[source.method]}. ${source.note ? `Justification: ${source.note}` : 'No justification was written.'}`
            : 'The case does not say where its volatility comes from: a reviewer should ask.'}
        </Para>
        <Text style={styles.h3}>Rights</Text>
        {(inputs.options ?? []).length === 0 ? <Para>None.</Para> : null}
        {describeRights(inputs.options, currency).map((r) => (
          <Para key={r.id}>{`${r.id}: ${r.terms}`}</Para>
        ))}
      </Section>

      <Section data={data} title="Convergence and the split of the premium">
        {convergence ? (
          <>
            <Table columns={['Steps', 'Expanded NPV']} widths={[50, 50]} rows={convergence.points.map((p) => [String(p.steps), m(p.expandedNpv, 3)])} />
            <Para>
              {`Extrapolated (taking the error as proportional to 1/N): ${m(convergence.extrapolated, 3)}; error estimate ${Number.isFinite(convergence.errorEstimate) ? m(convergence.errorEstimate, 3) : 'not available'}; band ${convergence.band ? `${m(convergence.band.low)} to ${m(convergence.band.high)}` : 'not available'}.${convergence.datesOnGrid ? '' : ' Not every date falls on the grid, so the coarser counts are N/4 and N/2.'} On the engine's table of thirty models the ~5000-step value lies inside such a band in 29.`}
            </Para>
          </>
        ) : (
          <Para>Convergence was not computed.</Para>
        )}
        <Text style={styles.h3}>Static NPV, premium and expanded NPV</Text>
        <Table
          columns={['Figure', 'Value']}
          widths={[60, 40]}
          rows={[
            ['Static NPV (no flexibility)', m(result.staticNpv)],
            ['Option premium', m(result.optionPremium)],
            ...(result.premiumSplit
              ? [
                  ['of which a better plan (volatility → 0)', m(result.premiumSplit.betterPlan)],
                  ['of which flexibility under uncertainty', m(result.premiumSplit.uncertainty)],
                ]
              : []),
            ['Expanded NPV', m(result.expandedNpv)],
          ]}
        />
        {premiumSplitText(result, currency) ? <Para>{premiumSplitText(result, currency)!}</Para> : null}
        {result.warnings.length > 0 ? (
          <>
            <Text style={styles.h3}>The engine&apos;s warnings</Text>
            {result.warnings.map((w, k) => (
              <Para key={k}>{`• ${warningSentence(w)}`}</Para>
            ))}
          </>
        ) : null}
      </Section>

      <Section data={data} title="Sensitivities">
        <Para>Each input moved both ways with all else fixed; the expanded NPV at each end (n/a where the moved model is refused).</Para>
        <Table
          columns={['Input', 'Low', 'Expanded NPV', 'High', 'Expanded NPV']}
          widths={[36, 16, 16, 16, 16]}
          rows={(result.sensitivities ?? []).map((s) => [
            s.label,
            formatNumber(s.low.input, 4),
            s.low.expandedNpv === null ? 'n/a' : m(s.low.expandedNpv),
            formatNumber(s.high.input, 4),
            s.high.expandedNpv === null ? 'n/a' : m(s.high.expandedNpv),
          ])}
        />
      </Section>

      <Section data={data} title="Independent cross-check">
        {crossCheck ? (
          <>
            <Para>
              {`A least-squares Monte Carlo (Longstaff & Schwartz 2001), written apart from the lattice, valued version ${data.caseVersion} on ${crossCheck.paths.toLocaleString('en-GB')} paths in each pass (seed ${crossCheck.seed}, ${formatDateTime(crossCheck.at)}), compared with ${crossCheck.engineVersion}.`}
            </Para>
            <Table
              columns={['Method', 'Expanded NPV', 'Standard error']}
              widths={[50, 25, 25]}
              rows={[
                [`Lattice, ${crossCheck.result.lattice.steps} steps`, m(crossCheck.result.lattice.expandedNpv), '—'],
                [
                  'Monte Carlo, fresh paths (biased down)',
                  m(crossCheck.result.monteCarlo.lowBiased.expandedNpv),
                  m(crossCheck.result.monteCarlo.lowBiased.standardError),
                ],
                [
                  'Monte Carlo, fitting paths (biased up)',
                  m(crossCheck.result.monteCarlo.highBiased.expandedNpv),
                  m(crossCheck.result.monteCarlo.highBiased.standardError),
                ],
              ]}
            />
            <Para>
              {crossCheck.result.verdict.agrees
                ? `Verdict: the two agree. The lattice's band (${m(crossCheck.result.verdict.latticeRange.low)} to ${m(crossCheck.result.verdict.latticeRange.high)}) meets the Monte Carlo's range of three standard errors (${m(crossCheck.result.verdict.monteCarloRange.low)} to ${m(crossCheck.result.verdict.monteCarloRange.high)}).`
                : `Verdict: the two disagree by ${m(crossCheck.result.verdict.gap)}; the lattice is ${m(Math.abs(crossCheck.result.verdict.difference))} ${crossCheck.result.verdict.difference > 0 ? 'above' : 'below'} the middle of the Monte Carlo's estimates.`}
            </Para>
            <Table
              columns={['Right', 'Used, lattice', 'Used, Monte Carlo', 'Differs']}
              widths={[40, 20, 20, 20]}
              textColumns={[3]}
              rows={crossCheck.result.verdict.rights.map((r) => [
                r.id,
                formatPercent(r.lattice),
                `${formatPercent(r.monteCarlo)} ± ${formatPercent(r.standardError)}`,
                r.differs ? 'yes' : 'no',
              ])}
            />
          </>
        ) : (
          <Para>{`No cross-check of version ${data.caseVersion} has finished. Run one from the case's Results tab, then produce this report again.`}</Para>
        )}
      </Section>

      <Section data={data} title="The engine's published-value checks">
        {references ? (
          <>
            <Para>
              {`Valued by ${references.engineVersion} when this build was made (${formatDateTime(references.generatedAt)}), from the tables its tests assert: ${passing} of ${references.checks.length} lie within their tolerance.${references.engineVersion === result.engineVersion ? '' : ` Note: this report's valuation ran on ${result.engineVersion}.`}`}
            </Para>
            <Table
              columns={['Source and case', 'Published', 'Engine', 'Tolerance', 'Within']}
              widths={[52, 12, 12, 12, 12]}
              textColumns={[4]}
              rows={references.checks.map((c) => [
                `${c.source}: ${c.what}`,
                formatNumber(c.published, 4),
                formatNumber(c.engine, 4),
                `± ${formatNumber(c.tolerance, 4)}`,
                c.passes ? 'yes' : 'NO',
              ])}
            />
          </>
        ) : (
          <Para>This build has no reference results (.data/reference-results.json is made by the build).</Para>
        )}
        <Text style={styles.caution}>{pdfText(VALUATION_CAUTION)}</Text>
      </Section>
    </Document>
  );
}
