/**
 * The shapes of the API's answers, as zod schemas with component ids: lib/openapi/operations.ts
 * names one per status of every operation, and the OpenAPI document is generated from them.
 * Output objects render with `additionalProperties: false`, so an answer that grows a field the
 * document does not name fails tests/e2e/openapi-conformance.test.ts. Where an answer carries
 * one of the engine's own structures (a model, a result), the headline fields are named and the
 * rest is described by docs/engine.md (a loose object).
 */
import { z } from 'zod';
import { cashFlowScheduleSchema } from '../cash-flows';
import { comparisonGroups } from '../comparison-rows';
import { caseSettingsSchema } from '../validations/case';
import { optionTemplateSchema } from '@/lattice';

const id = z.string().meta({ description: 'An opaque identifier.' });
const dateTime = z.string().meta({ format: 'date-time', description: 'An ISO 8601 instant (UTC).' });
const money = z.number().meta({ description: "An amount in the project's currency and units." });
const nullableName = z.string().nullable().meta({ description: 'A person, or an API key as "API key <name> (created by …)"; null when deleted.' });

export const errorSchema = z
  .object({
    error: z.object({
      code: z.enum([
        'bad_request',
        'unauthorized',
        'forbidden',
        'not_found',
        'conflict',
        'too_large',
        'unsupported_media_type',
        'unprocessable',
        'rate_limited',
        'unavailable',
        'internal',
      ]),
      message: z.string().meta({ description: 'A sentence for people: what is wrong and what to do.' }),
      fields: z.record(z.string(), z.array(z.string())).optional().meta({ description: 'Messages per input field (422), by dotted path.' }),
    }),
  })
  .meta({ id: 'Error', description: 'Every error answer has this shape.' });

export const projectSchema = z
  .object({
    id,
    name: z.string(),
    description: z.string(),
    currency: z.string().meta({ description: 'ISO 4217 code.' }),
    status: z.enum(['active', 'archived']),
    ownerId: z.string().nullable(),
    createdAt: dateTime,
    updatedAt: dateTime,
  })
  .meta({ id: 'Project' });

const headlineSchema = z
  .object({
    runId: id,
    caseId: id,
    caseName: z.string(),
    caseVersion: z.int(),
    currentVersion: z.int(),
    engineVersion: z.string(),
    staticNpv: money,
    optionPremium: money,
    expandedNpv: money,
    valuedAt: dateTime,
  })
  .meta({ id: 'Headline', description: "A case's latest stored valuation run, in figures." });

const approvalSchema = z
  .object({
    snapshotId: id,
    caseId: id,
    caseName: z.string(),
    caseVersion: z.int(),
    staticNpv: money,
    optionPremium: money,
    betterPlan: money.nullable(),
    flexibility: money.nullable(),
    expandedNpv: money,
    decidedAt: dateTime,
  })
  .meta({ id: 'Approval', description: 'The version of a project last approved, and its figures.' });

export const projectSummarySchema = z
  .object({
    id,
    name: z.string(),
    description: z.string(),
    currency: z.string(),
    status: z.enum(['active', 'archived']),
    ownerName: z.string().nullable(),
    caseCount: z.int(),
    updatedAt: dateTime,
    latest: headlineSchema.nullable(),
    approved: approvalSchema.nullable(),
    inReview: z.int(),
  })
  .meta({ id: 'ProjectSummary' });

const caseStatus = z.enum(['draft', 'in_review', 'approved', 'returned']);

export const caseSchema = z
  .object({
    id,
    projectId: id,
    name: z.string(),
    version: z.int().meta({ description: 'Send it back with an edit: an edit based on an older version is refused (409).' }),
    status: caseStatus,
    cashFlows: cashFlowScheduleSchema,
    settings: caseSettingsSchema,
    options: z.array(optionTemplateSchema),
    createdAt: dateTime,
    updatedAt: dateTime,
  })
  .meta({ id: 'Case' });

export const snapshotSchema = z
  .object({
    id,
    caseId: id,
    caseVersion: z.int(),
    caseName: z.string(),
    status: z.enum(['in_review', 'approved', 'returned', 'withdrawn']),
    engineVersion: z.string(),
    inputHash: z.string(),
    submittedAt: dateTime,
    decidedAt: dateTime.nullable(),
    decisionReason: z.string().nullable(),
    recommendation: z.string().nullable(),
  })
  .meta({ id: 'Snapshot', description: 'A submitted version, frozen: its inputs, figures and decision.' });

/** One of the engine's results: the headline figures named, the rest as docs/engine.md describes. */
export const valuationResultSchema = z
  .looseObject({
    value: money.meta({ description: 'Present value of the project at time 0 (V0).' }),
    staticNpv: money,
    optionPremium: money,
    expandedNpv: money,
  })
  .meta({ id: 'ValuationResult', description: "The engine's result (docs/engine.md): figures, rights, exercise boundaries, convergence." });

const comparisonRowSchema = z
  .object({
    group: z.enum(comparisonGroups),
    label: z.string(),
    values: z.array(z.string().nullable()).meta({ description: 'Formatted for people, one per case; null where a case has no such value.' }),
    numbers: z.array(z.number().nullable()).optional().meta({ description: 'The raw numbers where the row is numeric.' }),
    differs: z.boolean(),
  })
  .meta({ id: 'ComparisonRow' });

export const settingsSchemaOut = z
  .object({
    currency: z.string(),
    riskFreeRate: z.number().meta({ description: 'Continuously compounded, as a fraction a year.' }),
    wacc: z.number().meta({ description: 'As a fraction a year.' }),
    fiscalYearStartMonth: z.int().min(1).max(12),
    alertDaysBeforeClose: z.int().min(1).max(365).meta({ description: "How many days before a followed right's window closes its alert goes out." }),
  })
  .meta({ id: 'Settings', description: "The organisation's defaults for new projects and cases." });

export const apiKeySchema = z
  .object({
    id,
    name: z.string(),
    role: z.enum(['analyst', 'reviewer', 'viewer']),
    prefix: z.string().meta({ description: 'The first characters of the key, to tell keys apart.' }),
    createdAt: dateTime,
    createdBy: z.string().nullable(),
    expiresAt: dateTime.nullable(),
    lastUsedAt: dateTime.nullable(),
    revokedAt: dateTime.nullable(),
  })
  .meta({ id: 'ApiKey' });

export const apiKeyCreatedSchema = z
  .object({
    id,
    name: z.string(),
    role: z.enum(['analyst', 'reviewer', 'viewer']),
    prefix: z.string(),
    key: z.string().meta({ description: 'The secret, shown this once: Leeway keeps only its hash.' }),
    createdAt: dateTime,
    expiresAt: dateTime.nullable(),
  })
  .meta({ id: 'ApiKeyCreated' });

export const commentSchemaOut = z
  .object({
    id,
    section: z.string(),
    body: z.string(),
    author: nullableName,
    createdAt: dateTime,
    snapshotId: id.nullable().optional(),
  })
  .meta({ id: 'Comment' });

export const attachmentSchema = z
  .object({
    id,
    filename: z.string(),
    kind: z.enum(['pdf', 'xlsx', 'csv', 'png']),
    size: z.int().meta({ description: 'Bytes.' }),
    uploadedBy: nullableName,
    uploadedAt: dateTime,
  })
  .meta({ id: 'Attachment' });

export const activitySchema = z
  .object({
    id: z.union([z.string(), z.int()]),
    action: z.string().meta({ description: 'What was done, such as project.create or case.approve.' }),
    subjectType: z.string(),
    subjectId: z.string().nullable(),
    detail: z.record(z.string(), z.unknown()),
    actor: nullableName,
    at: dateTime,
  })
  .meta({ id: 'ActivityEntry' });

/** What every stored run says of itself: which version of the case, which model, which engine, when. */
const runFields = { id, caseVersion: z.int(), inputHash: z.string(), engineVersion: z.string(), createdAt: dateTime };

export const runSummarySchema = z
  .object({
    ...runFields,
    createdBy: nullableName,
    volatilitySource: z.unknown().nullable(),
    resultHash: z.string().meta({ description: 'SHA-256 of the result in canonical JSON (RFC 8785).' }),
    value: money,
    staticNpv: money,
    expandedNpv: money,
    optionPremium: money,
  })
  .meta({ id: 'ValuationRunSummary' });

export const storedRunSchema = z
  .object({
    ...runFields,
    warnings: z.array(z.unknown()),
    input: z.looseObject({}).meta({ description: 'The engine model the case compiles to (docs/engine.md).' }),
    result: valuationResultSchema,
  })
  .meta({ id: 'ValuationRun' });

export const snapshotListingSchema = z.object({
  status: caseStatus,
  changes: z
    .object({
      sinceReturned: z.object({ caseVersion: z.int(), decidedAt: dateTime, rows: z.array(comparisonRowSchema) }).nullable(),
      sameAsApproved: z.object({ caseVersion: z.int(), decidedAt: dateTime }).nullable(),
    })
    .nullable()
    .meta({ description: 'For a version in review: what changed since the version last returned, or the approved version it equals.' }),
  snapshots: z.array(
    z.object({
      id,
      caseVersion: z.int(),
      caseName: z.string(),
      status: z.enum(['in_review', 'approved', 'returned', 'withdrawn']),
      submittedAt: dateTime,
      submittedBy: nullableName,
      submittedByYou: z.boolean(),
      decidedAt: dateTime.nullable(),
      decidedBy: nullableName,
      decisionReason: z.string().nullable(),
      recommendation: z.string().nullable(),
      engineVersion: z.string(),
      inputHash: z.string(),
      staticNpv: money.nullable(),
      optionPremium: money.nullable(),
      expandedNpv: money.nullable(),
    }),
  ),
});

export const reviewQueueItemSchema = z
  .object({
    caseId: id,
    caseName: z.string(),
    status: caseStatus,
    projectId: id,
    projectName: z.string(),
    currency: z.string(),
    snapshotId: id,
    submittedAt: dateTime,
    decidedAt: dateTime.nullable(),
    submittedBy: nullableName,
    staticNpv: money,
    optionPremium: money,
    expandedNpv: money,
  })
  .meta({ id: 'ReviewQueueItem' });

export const comparisonSchema = z
  .object({
    cases: z.array(
      z.object({
        id,
        projectId: id,
        projectName: z.string(),
        caseName: z.string(),
        currency: z.string(),
        status: caseStatus,
        valuedAt: dateTime.nullable(),
        figuresVersion: z.int().nullable().meta({ description: 'The case version the figures are of.' }),
        version: z.int(),
        engineVersion: z.string().nullable().meta({ description: 'The engine that computed the figures (docs/engine.md); null when not valued yet.' }),
        staticNpv: money.nullable(),
        optionPremium: money.nullable(),
        expandedNpv: money.nullable(),
      }),
    ),
    rows: z.array(comparisonRowSchema),
  })
  .meta({ id: 'Comparison', description: 'Two to four cases side by side, one row per input or figure.' });

export const jobStartedSchema = z.object({ id, status: z.literal('running') });

export const revaluationSchema = z
  .object({
    id,
    status: z.enum(['running', 'done', 'failed']),
    total: z.int().nullable(),
    done: z.int(),
    failed: z.int(),
    error: z.string().nullable(),
    createdAt: dateTime,
    finishedAt: dateTime.nullable(),
  })
  .meta({ id: 'PortfolioRevaluation' });

export const simulationSchema = z
  .object({
    id,
    caseId: id,
    status: z.enum(['running', 'done', 'failed', 'cancelled']),
    progress: z.number().nullable(),
    spec: z.unknown(),
    result: z.unknown().nullable(),
    error: z.string().nullable(),
    createdAt: dateTime,
    finishedAt: dateTime.nullable(),
  })
  .meta({ id: 'VolatilitySimulation' });

export const historyEstimateSchema = z
  .looseObject({
    source: z.string(),
    volatility: z.number().meta({ description: 'Annualised, as a fraction.' }),
    interval: z.tuple([z.number(), z.number()]),
    confidence: z.number(),
    observations: z.int(),
    warnings: z.array(z.string()),
  })
  .meta({ id: 'HistoryEstimate' });

export const importPreviewSchema = z.object({
  preview: z.object({ cashFlows: z.looseObject({}), analysis: z.looseObject({}) }),
});

const estimateSchema = z.object({ expandedNpv: money, standardError: money });
const rangeSchema = z.object({ low: money, high: money });

export const crossCheckResultSchema = z
  .object({
    lattice: z.object({
      expandedNpv: money,
      band: rangeSchema.nullable().meta({ description: 'The convergence band (docs/engine.md §5).' }),
      steps: z.int(),
      engineVersion: z.string(),
      rights: z.array(z.object({ id: z.string(), exerciseProbability: z.number() })),
    }),
    monteCarlo: z.object({
      paths: z.int(),
      seed: z.int(),
      dates: z.int(),
      lowBiased: estimateSchema.meta({ description: 'The fitted rule on independent paths: biased down.' }),
      highBiased: estimateSchema.meta({ description: 'The fitted rule on the paths it was fitted to: biased up.' }),
      rights: z.array(z.object({ id: z.string(), probability: z.number(), standardError: z.number() })),
    }),
    verdict: z.object({
      agrees: z.boolean(),
      monteCarloRange: rangeSchema.meta({ description: '[low − 3·SE, high + 3·SE].' }),
      latticeRange: rangeSchema,
      gap: money.meta({ description: 'How far apart the two ranges are; 0 when they meet.' }),
      difference: money.meta({ description: "The lattice's value less the middle of the two estimates." }),
      rights: z.array(z.object({ id: z.string(), lattice: z.number(), monteCarlo: z.number(), standardError: z.number(), differs: z.boolean() })),
    }),
    seconds: z.number(),
  })
  .meta({ id: 'CrossCheckResult' });

export const crossCheckSchema = z
  .object({
    id,
    caseId: id,
    caseVersion: z.int(),
    engineVersion: z.string().meta({ description: 'The engine the lattice side ran with.' }),
    paths: z.int(),
    seed: z.int(),
    status: z.enum(['running', 'done', 'failed', 'cancelled']),
    progress: z.number(),
    result: crossCheckResultSchema.nullable(),
    error: z.string().nullable(),
    createdAt: dateTime,
    finishedAt: dateTime.nullable(),
  })
  .meta({ id: 'CrossCheck' });

export const rerunSchema = z
  .object({
    runId: id,
    caseVersion: z.int(),
    storedEngineVersion: z.string(),
    engineVersion: z.string().meta({ description: 'The engine that ran it now.' }),
    storedHash: z.string(),
    resultHash: z.string(),
    reproduced: z.boolean().meta({ description: 'True when the hashes are identical: the same figures to the last bit.' }),
    moved: z.array(z.object({ figure: z.string(), stored: z.number().nullable(), now: z.number().nullable(), change: z.number().nullable() })),
    partsThatDiffer: z.array(z.string()),
  })
  .meta({ id: 'RerunOutcome' });

export const watchSchema = z
  .object({
    followed: z.object({
      snapshotId: id,
      caseVersion: z.int(),
      valuationDate: z.string().meta({ description: 'YYYY-MM-DD: the approval of the version followed.' }),
      horizon: z.number().meta({ description: 'Years after the valuation date.' }),
      value: money.meta({ description: 'V at the valuation date.' }),
      replaces: z
        .object({ caseVersion: z.int(), approvedOn: z.string() })
        .nullable()
        .meta({ description: 'The approved version this one replaced as the model followed (its decisions stay on its record).' }),
    }),
    boundaries: z
      .array(
        z.object({
          id: z.string(),
          kind: z.string(),
          exerciseProbability: z.number(),
          boundary: z.array(
            z.object({
              t: z.number(),
              critical: money.nullable(),
              side: z.enum(['above', 'below', 'between', 'anywhere']),
              low: money.nullable(),
              high: money.nullable(),
            }),
          ),
        }),
      )
      .meta({ description: 'The approved rights with their boundaries (years after the valuation date), for charts.' }),
    asOf: z.string().meta({ description: 'YYYY-MM-DD: today, the date the rights are read at (the clock has moved since approval).' }),
    value: money.meta({ description: 'The project value V: the latest observed, or V at the valuation date.' }),
    valueOn: z.string().meta({ description: 'YYYY-MM-DD: when that value was observed (the valuation date before any observation).' }),
    rights: z.array(
      z.object({
        id: z.string(),
        name: z.string(),
        status: z.enum(['in_region', 'near', 'outside', 'window_not_open', 'window_closed', 'exercised', 'declined']),
        critical: money.nullable(),
        side: z.enum(['above', 'below', 'between', 'anywhere']).nullable(),
        distanceRatio: z.number().nullable().meta({ description: 'critical ÷ V − 1.' }),
        distanceSd: z.number().nullable().meta({ description: 'ln(critical ÷ V) ÷ σ: standard deviations of ln V over a year.' }),
        windowOpensAt: z.string().nullable(),
        windowClosesAt: z.string().nullable(),
      }),
    ),
    observations: z.array(
      z.object({ id, observedOn: z.string(), value: money, note: z.string(), source: z.string(), recordedAt: dateTime, recordedBy: nullableName }),
    ),
    decisions: z.array(
      z.object({
        id,
        rightId: z.string(),
        decision: z.enum(['exercised', 'declined', 'postponed']),
        decidedOn: z.string(),
        reason: z.string(),
        recordedAt: dateTime,
        recordedBy: nullableName,
      }),
    ),
    alerts: z
      .array(
        z.object({
          id,
          kind: z.enum(['in_region', 'near', 'window_opened', 'window_closing']),
          rightId: z.string(),
          message: z.string(),
          asOf: z.string(),
          createdAt: dateTime,
          caseId: id,
          caseName: z.string(),
          projectId: id,
          projectName: z.string(),
        }),
      )
      .meta({ description: 'The alerts raised on this case, newest first (at most 50).' }),
    revaluedExpandedNpv: money
      .nullable()
      .meta({ description: 'The approved model re-valued from that date with V, starting in the mode the recorded decisions made.' }),
  })
  .meta({ id: 'Watch' });
