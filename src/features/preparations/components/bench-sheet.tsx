import { LAB_DECIDES } from '../../../../shared/contracts/safety-advice';
import type { EquipmentItem } from '../../../../shared/contracts/library';
import type { PreparationDetail } from '../../../../shared/contracts/preparations';
import { Button } from '../../../components/ui/button';
import { plannedPlan } from '../utils/bench-readings';
import { benchSheetLines, type BenchLine } from '../utils/bench-sheet-lines';
import { STATUS_WORDS } from '../utils/status-words';
import { hazardNotesOf } from '../utils/equipment-labels';
import { HazardCaution } from '../../../components/hazard-caution';

const BLANK = <span className="inline-block h-7 w-full border-b border-ink/60" />;

function Readings({ line }: { line: BenchLine }) {
  const cells =
    line.readings === 'weighing'
      ? ['Tare (g)', 'Gross (g)', 'Net (g)', 'Time', 'Initials']
      : ['Done ☐', 'Time', 'Initials'];
  if (line.readings === 'none') return null;
  return (
    <table className="mt-2 w-full table-fixed border-collapse text-sm">
      <caption className="sr-only">Readings for step {line.stepNumber}</caption>
      <thead>
        <tr>
          {cells.map((cell) => (
            <th key={cell} scope="col" className="border border-line-strong px-2 py-1 text-left font-semibold">
              {cell}
            </th>
          ))}
        </tr>
      </thead>
      <tbody>
        <tr>
          {cells.map((cell) => (
            <td key={cell} className="h-10 border border-line-strong px-2">
              {cell === 'Done ☐' ? null : BLANK}
            </td>
          ))}
        </tr>
      </tbody>
    </table>
  );
}

type BenchSheetProps = { detail: PreparationDetail; library: EquipmentItem[] };

/** The printable sheet the analyst takes to the bench: steps in order, equipment IDs, targets, hazards, blanks for readings. */
export function BenchSheet({ detail, library }: BenchSheetProps) {
  const version = detail.current;
  // Once the readings are in, the plan holds the masses weighed; the sheet still prints what was planned.
  const plan = plannedPlan(version.snapshot?.plan ?? version.plan, version.readings);
  const settings = (plan.settings ?? {}) as { labTemperatureC?: number };
  const lines = benchSheetLines(plan, settings.labTemperatureC ?? 20);
  const hazards = new Map<string, string>();
  for (const item of version.snapshot?.items ?? [])
    if (item.hazardNotes.trim()) hazards.set(item.code, item.hazardNotes.trim());
  for (const step of (Array.isArray(plan.steps) ? plan.steps : []) as { material?: { libraryId?: string } }[]) {
    const item = library.find((each) => String(each.id) === step.material?.libraryId);
    if (item && hazardNotesOf(item)) hazards.set(item.code, hazardNotesOf(item));
  }

  return (
    <article className="bg-surface p-6 print:p-0">
      <header className="mb-4 flex flex-wrap items-start justify-between gap-4 border-b-2 border-ink pb-3">
        <div>
          <p className="text-sm font-semibold tracking-wide text-muted uppercase">Bench sheet</p>
          <h1 className="text-2xl font-bold">{detail.title}</h1>
          <p className="text-sm">
            Preparation {detail.id}, version {version.number} ({STATUS_WORDS[version.status].toLowerCase()}) · planned
            by {detail.createdBy}
          </p>
          {version.resultStatement ? (
            <p className="mt-1 font-semibold">
              {version.readings ? 'Result on the masses weighed' : 'Planned result'}: {version.resultStatement}
            </p>
          ) : null}
          {version.problem ? (
            <p className="mt-1 font-semibold text-danger">The plan is not complete: {version.problem.message}</p>
          ) : null}
        </div>
        <div className="print:hidden">
          <Button onClick={() => window.print()}>Print</Button>
        </div>
      </header>

      <dl className="mb-4 grid grid-cols-3 gap-4 text-sm">
        {['Prepared on', 'Prepared by', 'Lab temperature (°C)'].map((term) => (
          <div key={term}>
            <dt className="font-semibold">{term}</dt>
            <dd>{BLANK}</dd>
          </div>
        ))}
      </dl>

      {[...hazards].map(([code, notes]) => (
        <div key={code} className="mb-4 break-inside-avoid">
          <HazardCaution title={`Hazards of ${code}`} entries={[{ key: code, code, notes }]} />
        </div>
      ))}

      <ol className="space-y-4">
        {lines.map((line) => (
          <li
            key={line.stepNumber}
            className="break-inside-avoid rounded-md border border-line p-3 print:border-ink/40"
          >
            {line.first ? (
              <p className="mb-1 rounded-md bg-caution-tint px-2 py-1 font-semibold text-caution">{line.first}</p>
            ) : null}
            <p>
              <span className="mr-2 font-bold">Step {line.stepNumber}.</span>
              {line.action}
            </p>
            <p className="text-sm text-muted">Equipment: {line.equipment.filter(Boolean).join(', ') || '—'}</p>
            <Readings line={line} />
          </li>
        ))}
      </ol>

      <div className="mt-6 grid grid-cols-2 gap-8 text-sm break-inside-avoid">
        <div>
          <p className="font-semibold">Deviations from the plan</p>
          <div className="mt-1 h-20 border border-line-strong" />
        </div>
        <div className="space-y-4">
          <p>
            <span className="font-semibold">Prepared by (signature)</span> {BLANK}
          </p>
          <p>
            <span className="font-semibold">Checked by (signature)</span> {BLANK}
          </p>
        </div>
      </div>
      <p className="mt-4 text-xs text-muted">{LAB_DECIDES}</p>
    </article>
  );
}
