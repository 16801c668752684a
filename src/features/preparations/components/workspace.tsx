import { lazy, Suspense, useCallback, useMemo, useRef, useState, type ReactNode } from 'react';
import type { EquipmentItem, LabPolicy } from '../../../../shared/contracts/library';
import type { PreparationDetail, PreparationWrite } from '../../../../shared/contracts/preparations';
import type { Snapshot } from '../../../../shared/contracts/snapshot';
import { warningText } from '../../../../shared/contracts/warning-text';
import { parsePlan, PlanError, type PlanInput } from '../../../../shared/uncertainty';
import { Alert } from '../../../components/ui/alert';
import { LoadingLine } from '../../../components/ui/loading-line';
import { useAutosave } from '../hooks/use-autosave';
import { placedWarnings, type ShownResult } from '../utils/budget-warnings';
import { hazardNotesOf } from '../utils/equipment-labels';
import {
  checkDraft,
  evaluateDraft,
  evaluationKey,
  fieldMessage,
  problemLine,
  type DraftEvaluation,
} from '../utils/evaluate-draft';
import { overridesToSave, storedPlan, type PlanDraft } from '../utils/plan-draft';
import { stepNamer } from '../utils/step-names';
import { BudgetTable } from './budget-table';
import { HazardCaution } from '../../../components/hazard-caution';
import { MonteCarloPanel, type LiveCheck } from './monte-carlo-panel';
import { PlanEditor } from './plan-editor';
import { ResultStatement } from './result-statement';
import { SaveStateLine } from './save-state-line';

const ContributionCharts = lazy(() => import('./contribution-charts'));

type WorkspaceProps = {
  initialDraft: PlanDraft;
  /** The key of the write the server already holds (nothing to autosave until it changes). */
  savedKey: string | null;
  library: EquipmentItem[];
  policy: LabPolicy;
  editable: boolean;
  /** The stored result of a read-only version (its snapshot): shown instead of a live recomputation. */
  stored: (ShownResult & { plan: PlanInput } & Pick<Snapshot, 'monteCarlo' | 'validation'>) | null;
  save: (write: PreparationWrite) => Promise<PreparationDetail>;
  onSaved?: (detail: PreparationDetail, draft: PlanDraft, savedKey: string) => void;
  /** The page header, given the save-state line and the current draft. */
  header: (saveLine: ReactNode, draft: PlanDraft) => ReactNode;
  /** What was weighed at the bench, shown above the budget of a prepared version. */
  readings?: ReactNode;
};

/**
 * What autosave sends for a draft, or the reason it cannot be sent yet: the server keeps a well-formed plan
 * it cannot compute (with its problem) but refuses one that is not a plan document yet (a step without its
 * equipment, a mass that is not a number), so such a draft waits here until the marked field is filled.
 */
export function writeOf(
  draft: PlanDraft,
  library: Map<string, EquipmentItem>,
): { write: PreparationWrite | null; blocked: string | null } {
  if (!draft.title.trim()) return { write: null, blocked: 'give the preparation a title.' };
  if (!draft.materialId) return { write: null, blocked: 'choose the reference material.' };
  const plan = storedPlan(draft, library);
  try {
    parsePlan(plan);
  } catch (error) {
    if (error instanceof PlanError) {
      // The planner's own check names the field in the words shown beside it; the engine's message is the fallback.
      const own = checkDraft(draft, library);
      return {
        write: null,
        blocked: `complete the plan first (${own ? problemLine(own) : fieldMessage(error.message)})`,
      };
    }
    throw error;
  }
  return {
    write: { title: draft.title.trim(), plan, overrides: overridesToSave(draft), seed: draft.seed },
    blocked: null,
  };
}

/**
 * The analyst's workspace: the plan editor with the live GUM budget beside it (recomputed on every change
 * with the shared engine and the lab policy), the budget table, charts, Monte Carlo in a worker and autosave.
 */
export function Workspace({
  initialDraft,
  savedKey,
  library,
  policy,
  editable,
  stored,
  save,
  onSaved,
  header,
  readings,
}: WorkspaceProps) {
  const [draft, setDraft] = useState(initialDraft);
  const libraryById = useMemo(() => new Map(library.map((item) => [String(item.id), item])), [library]);
  // VF-25-A before VF-100-A: codes in natural order.
  const sortedLibrary = useMemo(
    () => [...library].sort((a, b) => a.code.localeCompare(b.code, 'en', { numeric: true })),
    [library],
  );
  // The same plan (a renamed title, a retyped "0.1599") keeps the same result object, so the table and charts skip repainting.
  const previous = useRef<{ key: string; evaluation: DraftEvaluation } | null>(null);
  const evaluation = useMemo(() => {
    const next = evaluateDraft(draft, libraryById, policy);
    const key = evaluationKey(next);
    if (previous.current?.key === key) return previous.current.evaluation;
    previous.current = { key, evaluation: next };
    return next;
  }, [draft, libraryById, policy]);
  const lastValid = useRef<(ShownResult & { plan: PlanInput }) | null>(null);
  if (evaluation.ok)
    lastValid.current = { budget: evaluation.budget, plan: evaluation.plan, warnings: evaluation.budget.warnings };

  const shown = stored ?? lastValid.current;
  const stale = !stored && !evaluation.ok;
  const budget = shown?.budget ?? null;
  // The stated result: the stored snapshot's, or the live budget's (no Monte Carlo yet); the same object while the
  // budget is, so the statement skips repainting as the title is typed.
  // A finished verdict run states the Monte Carlo interval here as on the record, but only for the budget it judged.
  const [liveCheck, setLiveCheck] = useState<LiveCheck | null>(null);
  const statedResult = useMemo(() => {
    if (stored) return stored;
    if (!budget) return null;
    const check = liveCheck?.budget === budget ? liveCheck : null;
    return {
      plan: { settings: { monteCarloInterval: policy.monteCarloInterval } },
      budget,
      monteCarlo: check?.monteCarlo ?? null,
      validation: check?.validation ?? null,
    };
  }, [stored, budget, liveCheck, policy.monteCarloInterval]);
  const liveProblem = stored ? null : evaluation.problem;
  const warnings = placedWarnings(shown, draft, libraryById);
  const planWarnings = warnings.filter((warning) => !('stepIndex' in warning)).map(warningText);
  const stepName = useMemo(
    () => stepNamer(draft.steps, draft.materialId, libraryById),
    [draft.steps, draft.materialId, libraryById],
  );

  const draftRef = useRef(draft);
  draftRef.current = draft;
  const [serverProblem, setServerProblem] = useState<string | null>(null);
  const { write, blocked } = writeOf(draft, libraryById);
  const saveState = useAutosave({
    write,
    blocked,
    enabled: editable,
    save,
    initialKey: savedKey,
    onSaved: (detail, key) => {
      setServerProblem(detail.current.problem ? detail.current.problem.message : null);
      onSaved?.(detail, draftRef.current, key);
    },
  });

  const monteCarloPlan = stored ? stored.plan : evaluation.ok ? evaluation.plan : null;
  const changeSeed = useCallback((seed: number) => setDraft((current) => ({ ...current, seed })), []);
  const material = libraryById.get(draft.materialId);

  return (
    <>
      {header(editable ? <SaveStateLine state={saveState} /> : null, draft)}
      {serverProblem && evaluation.ok ? (
        <div className="mb-4">
          <Alert tone="danger" title="The server could not compute this draft">
            {serverProblem}
          </Alert>
        </div>
      ) : null}
      {material ? (
        <div className="mb-6">
          <HazardCaution
            title={`Hazards of ${material.code}`}
            entries={[{ key: material.code, code: material.code, notes: hazardNotesOf(material) }]}
          />
        </div>
      ) : null}
      <div className="grid items-start gap-8 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
        <section aria-labelledby="plan-heading">
          <h2 id="plan-heading" className="sr-only">
            Plan
          </h2>
          <PlanEditor
            draft={draft}
            onChange={setDraft}
            library={sortedLibrary}
            problem={liveProblem}
            budget={budget}
            warnings={warnings}
            readOnly={!editable}
          />
        </section>
        <aside aria-labelledby="result-heading" className="lg:sticky lg:top-4">
          <section className={`rounded-lg border bg-surface p-5 ${stale ? 'border-line opacity-60' : 'border-ink'}`}>
            <h2 id="result-heading" className="mb-2 text-lg font-bold">
              Result
            </h2>
            {stale && budget ? (
              <p className="mb-2 text-sm font-semibold text-danger">
                Last valid result, shown until the marked field is fixed.
              </p>
            ) : null}
            {statedResult ? (
              <ResultStatement result={statedResult} />
            ) : (
              <p className="text-muted">The budget appears as soon as the plan is complete.</p>
            )}
            {stored ? (
              <p className="mt-2 text-sm text-muted">
                As stored when this version was computed{readings ? ', on the masses weighed' : ''}.
              </p>
            ) : null}
          </section>
          {planWarnings.length > 0 ? (
            <ul className="mt-3 space-y-1">
              {planWarnings.map((text) => (
                <li key={text} className="rounded-md bg-caution-tint px-3 py-1.5 text-sm font-semibold text-caution">
                  {text}
                </li>
              ))}
            </ul>
          ) : null}
          {budget ? (
            <div className="mt-4 rounded-lg border border-line bg-surface p-4">
              <Suspense fallback={<LoadingLine label="Drawing the charts…" />}>
                <ContributionCharts
                  byStep={budget.byStep}
                  byCategory={budget.byCategory}
                  stepName={stepName}
                  stale={stale}
                />
              </Suspense>
            </div>
          ) : null}
        </aside>
      </div>

      {readings ? <div className="mt-10">{readings}</div> : null}

      {budget ? (
        <section aria-labelledby="budget-heading" className={`mt-10 ${stale ? 'opacity-60' : ''}`}>
          <h2 id="budget-heading" className="mb-2 text-xl font-bold">
            Uncertainty budget
          </h2>
          <BudgetTable budget={budget} stepName={stepName} />
        </section>
      ) : null}

      <section aria-labelledby="monte-carlo-heading" className="mt-10 rounded-lg border border-line bg-surface p-5">
        <h2 id="monte-carlo-heading" className="mb-3 text-xl font-bold">
          Monte Carlo check
        </h2>
        <MonteCarloPanel
          plan={monteCarloPlan}
          budget={budget}
          seed={draft.seed}
          onSeedChange={changeSeed}
          seedEditable={editable}
          onCheck={setLiveCheck}
        />
      </section>
    </>
  );
}
