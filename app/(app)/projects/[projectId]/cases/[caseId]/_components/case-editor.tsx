'use client';

import { useState } from 'react';
import useSWR from 'swr';
import { FieldProblems, useFieldProblemList } from '@/components/field-problems';
import { LoadError, LoadingBlock } from '@/components/load-state';
import { Button } from '@/components/ui/button';
import { Tabs } from '@/components/ui/tabs';
import { rightIds, type OptionTemplate } from '@/lattice';
import { getJson } from '@/lib/api-client';
import type { CaseJson } from '@/lib/case-json';
import { useValuation } from '@/lib/engine/use-engine';
import { issueInWords } from '@/lib/issue-words';
import { cardBasis } from '@/lib/option-form';
import { submissionGaps } from '@/lib/submission-gaps';
import { usageNotes } from '@/lib/usage-notes';
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
import { LiveFigures } from './live-figures';
import { useCaseRecord } from './use-case-record';
import { useDraftModel } from './use-draft-model';
import { useUnsavedWarning } from './use-unsaved-warning';

interface Props {
  caseId: string;
  projectId: string;
  projectName: string;
  currency: string;
  canEdit: boolean;
  rights: ReviewRights;
  /** The tab to open first, named by the address's `?tab=` (a link from an alert opens the Watch tab). */
  initialTab?: string;
}

/** The case as the page loaded it: shown at once, and fetched again only after a save or a conflict. */
type EditorProps = Props & { loaded: CaseJson };

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
  const record = useCaseRecord({ caseId, currency, initial, reload });
  const { draft, update, version, status, dirty } = record;
  const options = (draft.options ?? []) as OptionTemplate[];
  const [invalidCells, setInvalidCells] = useState(0);
  const [optionProblems, setOptionProblems] = useState(0);
  // Fields whose text is not a valid value (components/field-problems.tsx), by label.
  const { report: reportProblem, problems: wrongFields } = useFieldProblemList(record.markUnsaved);

  const { analysis, horizon, built, model, maxSteps } = useDraftModel(draft);
  const valuation = useValuation(model, {});
  const result = model ? valuation.result : null;
  const notValued = 'problem' in built ? built.problem : valuation.issues ? valuation.issues.map((i) => issueInWords(i.message, options)).join('; ') : null;

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
  const ignored = [
    ...wrongFields.map(([field, problem]) => `${field}: ${problem}`),
    ...(invalidCells > 0 ? [`${invalidCells} cash-flow cell${invalidCells > 1 ? 's are' : ' is'} not a number`] : []),
    ...(optionProblems > 0 ? [`${optionProblems} field${optionProblems > 1 ? 's' : ''} of the rights ${optionProblems > 1 ? 'are' : 'is'} not valid`] : []),
  ];

  // A case in review is frozen for everyone until a reviewer returns it; an approved one until
  // someone starts a revision, so no keystroke quietly turns it into a draft.
  const readOnly = !canEdit || status === 'in_review' || status === 'approved';

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
          latestRun={record.latestRun}
          runsLoaded={record.runsLoaded}
          readOnly={readOnly}
          canEdit={canEdit}
          canDecide={rights.canDecide}
          saving={record.saving}
          onSave={() => void record.save(blocked)}
          valuing={record.valuing}
          canValue={model !== null && blocked === null}
          onValue={() => void record.valueCase(blocked)}
          revising={record.revising}
          onRevise={() => void record.startRevision()}
        />
        {record.conflict ? (
          <div
            role="alert"
            className="flex flex-wrap items-center justify-between gap-3 rounded-md border border-brick-500 bg-brick-100 px-4 py-3 text-brick-700"
          >
            <p>{record.conflict}</p>
            <Button variant="secondary" onClick={reload}>
              Load the saved version (drops my changes)
            </Button>
          </div>
        ) : null}

        <LiveFigures
          result={result}
          currency={currency}
          busy={valuation.computing}
          ignored={ignored}
          notValued={notValued}
          npvAtWacc={analysis?.npvAtWacc ?? null}
        />

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
                    options={options}
                    horizon={horizon}
                    basis={cardBasis(analysis, horizon, draft.settings.riskFreeRate)}
                    engineProblems={'cards' in built ? built.cards : undefined}
                    // From the last answer while the next is computed, so the cards do not jump
                    // on every keystroke; matched by id and kind, a note never lands on another card.
                    usage={result ? usageNotes(options, result.rights) : undefined}
                    readOnly={readOnly}
                    onChange={(options, problems) => {
                      setOptionProblems(problems);
                      if (options) update({ options });
                      else record.markUnsaved();
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
                  ) : notValued ? (
                    <div role="alert" className="rounded-card border border-brick-500 bg-brick-100 px-5 py-4 text-brick-700">
                      <p className="font-medium">The engine cannot value this case as it stands.</p>
                      <p className="mt-1">{notValued}</p>
                      <p className="mt-2 text-caption">
                        Change the figure it names (Uncertainty holds the steps; Flexibility the rights) and the results appear here at once.
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
                  rightIds={rightIds(options)}
                  gaps={submissionGaps(draft, result?.warnings)}
                  rights={rights}
                  beforeSubmit={() => record.readyToSubmit(blocked)}
                  onStatus={record.setStatus}
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
