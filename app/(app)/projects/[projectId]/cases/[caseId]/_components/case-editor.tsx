'use client';

import { useCallback, useState } from 'react';
import useSWR from 'swr';
import { FieldProblems, useFieldProblemList } from '@/components/field-problems';
import { LoadError, LoadingBlock } from '@/components/load-state';
import { Button } from '@/components/ui/button';
import { Tabs } from '@/components/ui/tabs';
import { useToast } from '@/components/ui/toast';
import type { OptionTemplate } from '@/lattice';
import { ApiError, getJson, sendJson } from '@/lib/api-client';
import type { CaseJson } from '@/lib/case-json';
import { useValuation } from '@/lib/engine/use-engine';
import { formatMoney } from '@/lib/format';
import { issueInWords } from '@/lib/issue-words';
import { cardBasis } from '@/lib/option-form';
import type { CaseInput } from '@/lib/validations/case';
import type { CaseStatus } from '@/lib/review/transitions';
import { AttachmentsPanel } from './attachments-panel';
import { CashFlowImport } from './cash-flow-import';
import { CashFlowSection } from './cash-flow-section';
import { CompiledView } from './compiled-view';
import { LatticeSection } from './lattice-section';
import { LatticeSettingsSection } from './lattice-settings-section';
import { OptionCards } from './option-cards';
import { ResultsSection } from './results-section';
import { StoredRuns } from './stored-runs';
import { CrossCheckPanel } from './cross-check-panel';
import { ValidationReportPanel } from './validation-report-panel';
import { WatchPanel } from './watch-panel';
import { CaseHeader } from './case-header';
import { ReviewPanel, type ReviewRights } from './review-panel';
import { useDraftModel } from './use-draft-model';
import { useUnsavedWarning } from './use-unsaved-warning';

interface Props {
  caseId: string;
  projectId: string;
  projectName: string;
  currency: string;
  canEdit: boolean;
  rights: ReviewRights;
  /** The tab to open first (a link from an alert opens the Watch tab). */
  initialTab?: string;
}

/** The case as the page loaded it: shown at once, and fetched again only after a save or a conflict. */
type EditorProps = Props & { loaded: CaseJson };

interface RunSummary {
  id: string;
  caseVersion: number;
  createdAt: string;
  createdBy: string | null;
  expandedNpv: number;
}

export function CaseEditor({ loaded, ...props }: EditorProps) {
  const { data, error, isLoading, mutate } = useSWR<{ case: CaseJson }>(`/api/v1/cases/${props.caseId}`, getJson, {
    fallbackData: { case: loaded },
    revalidateOnMount: false,
    revalidateOnFocus: false,
  });
  if (isLoading) return <LoadingBlock label="Loading the case" lines={8} />;
  if (error || !data) return <LoadError message={error?.message ?? 'No answer from the server.'} onRetry={() => mutate()} />;
  return <LoadedEditor key={`${data.case.id}:${data.case.version}`} {...props} initial={data.case} reload={() => mutate()} />;
}

function toInput(c: CaseJson): CaseInput {
  return { name: c.name, cashFlows: c.cashFlows, settings: c.settings, options: c.options };
}

function Headline({ label, value, strong, busy }: { label: string; value: string; strong?: boolean; busy: boolean }) {
  return (
    <div className={`rounded-card border px-4 py-3 ${strong ? 'border-tide-500 bg-tide-50' : 'border-line bg-paper-raised'}`}>
      <p className="text-caption font-medium uppercase tracking-wide text-ink-soft">{label}</p>
      <p className={`figures mt-0.5 text-title ${busy ? 'opacity-60' : ''}`} aria-live="polite">
        {value}
      </p>
    </div>
  );
}

function LoadedEditor({
  caseId,
  projectId,
  projectName,
  currency,
  canEdit,
  rights,
  initial,
  reload,
  initialTab,
}: Props & { initial: CaseJson; reload: () => void }) {
  const toast = useToast();
  const [draft, setDraft] = useState<CaseInput>(() => toInput(initial));
  const [version, setVersion] = useState(initial.version);
  const [status, setStatus] = useState<CaseStatus>(initial.status as CaseStatus);
  const [dirty, setDirty] = useState(false);
  const [invalidCells, setInvalidCells] = useState(0);
  const [optionProblems, setOptionProblems] = useState(0);
  // Fields whose text is not a valid value (components/field-problems.tsx), by label.
  const markUnsaved = useCallback(() => setDirty(true), []);
  const { report: reportProblem, problems: wrongFields } = useFieldProblemList(markUnsaved);
  const [saving, setSaving] = useState(false);
  const [valuing, setValuing] = useState(false);
  const [conflict, setConflict] = useState<string | null>(null);
  const runs = useSWR<{ runs: RunSummary[] }>(`/api/v1/cases/${caseId}/valuations`, getJson, { revalidateOnFocus: false });

  const update = (patch: Partial<CaseInput>) => {
    setDraft((d) => ({ ...d, ...patch }));
    setDirty(true);
  };

  const { analysis, horizon, built, model, maxSteps } = useDraftModel(draft);
  const valuation = useValuation(model, {});
  const result = model ? valuation.result : null;

  useUnsavedWarning(dirty);

  const blocked =
    wrongFields.length > 0
      ? `Fix ${wrongFields.map(([field, problem]) => `“${field}” (${problem})`).join(', ')} first.`
      : invalidCells > 0
        ? 'Fix the cells marked in red first.'
        : optionProblems > 0
          ? 'Fix the fields of the rights marked in red first.'
          : draft.name.trim() === ''
            ? 'Give the case a name first.'
            : null;

  const save = async (): Promise<boolean> => {
    if (blocked) {
      toast(blocked, 'error');
      return false;
    }
    setSaving(true);
    try {
      const { case: saved } = await sendJson<{ case: CaseJson }>('PATCH', `/api/v1/cases/${caseId}`, { ...draft, version });
      setVersion(saved.version);
      setStatus(saved.status as CaseStatus);
      setDirty(false);
      setConflict(null);
      toast(`Saved as version ${saved.version}.`, 'success');
      return true;
    } catch (error) {
      if (error instanceof ApiError && error.status === 409) setConflict(error.message);
      else toast(error instanceof Error ? error.message : 'Saving did not work.', 'error');
      return false;
    } finally {
      setSaving(false);
    }
  };

  /** Before a submission: unsaved edits are saved first, so the reviewers see what is on screen. */
  const readyToSubmit = async (): Promise<boolean> => {
    if (dirty) return save();
    if (blocked) toast(blocked, 'error');
    return !blocked;
  };

  const valueCase = async () => {
    if (dirty && !(await save())) return;
    setValuing(true);
    try {
      const { run } = await sendJson<{ run: { result: { expandedNpv: number } } }>('POST', `/api/v1/cases/${caseId}/valuations`);
      toast(`Valuation stored: expanded NPV ${formatMoney(run.result.expandedNpv, currency)}.`, 'success');
      await runs.mutate();
    } catch (error) {
      toast(error instanceof Error ? error.message : 'Valuing did not work.', 'error');
    } finally {
      setValuing(false);
    }
  };

  const latestRun = runs.data?.runs[0];
  const busy = valuation.computing;
  // A case in review is frozen for everyone until a reviewer returns it; an approved one until
  // someone starts a revision, so no keystroke quietly turns it into a draft.
  const readOnly = !canEdit || status === 'in_review' || status === 'approved';
  const [revising, setRevising] = useState(false);
  const startRevision = async () => {
    setRevising(true);
    try {
      const { case: revised } = await sendJson<{ case: CaseJson }>('POST', `/api/v1/cases/${caseId}/revisions`);
      toast(`Revision started: version ${revised.version} is a draft. The approved version and its board pack stay as they are.`, 'success');
      reload();
    } catch (error) {
      toast(error instanceof Error ? error.message : 'The revision could not be started.', 'error');
    } finally {
      setRevising(false);
    }
  };

  return (
    <FieldProblems.Provider value={reportProblem}>
      <div className="flex flex-col gap-6">
        <CaseHeader
          caseId={caseId}
          projectId={projectId}
          projectName={projectName}
          name={draft.name}
          onName={(name) => update({ name })}
          status={status}
          version={version}
          dirty={dirty}
          latestRun={latestRun}
          runsLoaded={runs.data !== undefined}
          readOnly={readOnly}
          canEdit={canEdit}
          canDecide={rights.canDecide}
          saving={saving}
          onSave={() => void save()}
          valuing={valuing}
          canValue={model !== null && blocked === null}
          onValue={() => void valueCase()}
          revising={revising}
          onRevise={() => void startRevision()}
        />
        {conflict ? (
          <div
            role="alert"
            className="flex flex-wrap items-center justify-between gap-3 rounded-md border border-brick-500 bg-brick-100 px-4 py-3 text-brick-700"
          >
            <p>{conflict}</p>
            <Button variant="secondary" onClick={reload}>
              Load the saved version (drops my changes)
            </Button>
          </div>
        ) : null}

        <div className="grid gap-4 sm:grid-cols-3">
          <Headline label="Static NPV" value={formatMoney(result?.staticNpv, currency)} busy={busy} />
          <Headline label="Option premium" value={formatMoney(result?.optionPremium, currency)} busy={busy} />
          <Headline label="Expanded NPV" value={formatMoney(result?.expandedNpv, currency)} strong busy={busy} />
        </div>
        {wrongFields.length > 0 || invalidCells > 0 || optionProblems > 0 ? (
          <p role="alert" className="-mt-3 rounded-md border border-brick-500 bg-brick-100 px-3 py-2 text-caption text-brick-700">
            These figures use the last valid values, not what is on screen:{' '}
            {[
              ...wrongFields.map(([field, problem]) => `${field}: ${problem}`),
              ...(invalidCells > 0 ? [`${invalidCells} cash-flow cell${invalidCells > 1 ? 's are' : ' is'} not a number`] : []),
              ...(optionProblems > 0
                ? [`${optionProblems} field${optionProblems > 1 ? 's' : ''} of the rights ${optionProblems > 1 ? 'are' : 'is'} not valid`]
                : []),
            ].join('; ')}
            . The case cannot be saved or valued until they are fixed.
          </p>
        ) : null}
        <p className="-mt-3 text-caption text-ink-muted" aria-live="polite">
          {'problem' in built
            ? `Not valued: ${built.problem}`
            : valuation.issues
              ? `Not valued: ${valuation.issues.map((i) => issueInWords(i.message, (draft.options ?? []) as OptionTemplate[])).join('; ')}`
              : busy
                ? 'Recomputing in your browser…'
                : 'Computed live in your browser from the figures on screen; “Value case” stores a run on the server.'}
          {result && analysis && Math.abs(result.staticNpv - analysis.npvAtWacc) > 0.05
            ? ` Static NPV here is the plan without flexibility as the lattice values it: a defer cost or stage payments are discounted at the risk-free rate (the NPV at the WACC is ${formatMoney(analysis.npvAtWacc, currency)}, see Cash flows).`
            : ''}
        </p>

        <Tabs
          initial={initialTab}
          tabs={[
            {
              id: 'cash-flows',
              label: 'Cash flows',
              content: (
                <CashFlowSection
                  cashFlows={draft.cashFlows}
                  analysis={analysis}
                  currency={currency}
                  readOnly={readOnly}
                  onChange={(cashFlows) => update({ cashFlows })}
                  onInvalidCount={setInvalidCells}
                  importer={
                    readOnly ? null : (
                      <CashFlowImport
                        caseId={caseId}
                        version={version}
                        currency={currency}
                        disabledReason={dirty ? 'Save or discard your changes first: an import replaces the cash flows and saves.' : null}
                        onImported={reload}
                      />
                    )
                  }
                />
              ),
            },
            {
              id: 'uncertainty',
              label: 'Uncertainty',
              content: (
                <LatticeSettingsSection
                  caseId={caseId}
                  unsaved={dirty}
                  settings={draft.settings}
                  horizon={horizon}
                  readOnly={readOnly}
                  maxSteps={maxSteps}
                  onChange={(settings) => update({ settings })}
                />
              ),
            },
            {
              id: 'flexibility',
              label: 'Flexibility',
              content: (
                <div className="flex flex-col gap-6">
                  <OptionCards
                    options={(draft.options ?? []) as OptionTemplate[]}
                    horizon={horizon}
                    basis={cardBasis(analysis, horizon, draft.settings.riskFreeRate)}
                    engineProblems={'cards' in built ? built.cards : undefined}
                    readOnly={readOnly}
                    onChange={(options, problems) => {
                      setOptionProblems(problems);
                      if (options) update({ options });
                      else setDirty(true);
                    }}
                  />
                  <details className="rounded-card border border-line bg-paper-raised p-5">
                    <summary className="cursor-pointer font-medium">Advanced: the operating modes and switches these rights compile to</summary>
                    <div className="mt-4">
                      <CompiledView model={model} />
                    </div>
                  </details>
                </div>
              ),
            },
            {
              id: 'results',
              label: 'Results',
              content: (
                <div className="flex flex-col gap-6">
                  {result ? (
                    <ResultsSection result={result} currency={currency} />
                  ) : 'problem' in built || valuation.issues ? (
                    <div role="alert" className="rounded-card border border-brick-500 bg-brick-100 px-5 py-4 text-brick-700">
                      <p className="font-medium">The engine cannot value this case as it stands.</p>
                      <p className="mt-1">
                        {'problem' in built
                          ? built.problem
                          : valuation.issues!.map((i) => issueInWords(i.message, (draft.options ?? []) as OptionTemplate[])).join('; ')}
                      </p>
                      <p className="mt-2 text-caption">
                        Change the figure it names (Uncertainty holds the steps; Flexibility the options) and the results appear here at once.
                      </p>
                    </div>
                  ) : (
                    <LoadingBlock label="Valuing the case" lines={5} />
                  )}
                  <StoredRuns caseId={caseId} currency={currency} canRerun={rights.canRerun} />
                  <CrossCheckPanel caseId={caseId} currency={currency} canStart={rights.canCrossCheck} unsaved={dirty} />
                  <ValidationReportPanel caseId={caseId} canAttach={rights.canCrossCheck} unsaved={dirty} />
                </div>
              ),
            },
            {
              id: 'lattice',
              label: 'Lattice',
              content:
                model && 'modes' in built ? (
                  <LatticeSection model={model} modes={built.modes} startMode={built.start} result={result} currency={currency} />
                ) : (
                  <p className="text-ink-soft">The lattice appears once the case can be valued.</p>
                ),
            },
            {
              id: 'documents',
              label: 'Documents',
              content: <AttachmentsPanel caseId={caseId} canEdit={canEdit} />,
            },
            {
              id: 'watch',
              label: 'Watch',
              lazy: true,
              content: <WatchPanel caseId={caseId} currency={currency} canRecord={canEdit} />,
            },
            {
              id: 'review',
              label: 'Review',
              content: (
                <ReviewPanel
                  caseId={caseId}
                  currency={currency}
                  status={status}
                  optionNames={((draft.options ?? []) as OptionTemplate[]).map((o, k) => o.id ?? `Right ${k + 1}`)}
                  rights={rights}
                  beforeSubmit={readyToSubmit}
                  onStatus={setStatus}
                  figures={result}
                />
              ),
            },
          ]}
        />
      </div>
    </FieldProblems.Provider>
  );
}
