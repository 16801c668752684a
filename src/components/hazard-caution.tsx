import { SAFETY_ADVICE } from '../../shared/contracts/safety-advice';

export type HazardEntry = { key: string | number; code?: string; notes: string };

/**
 * The caution box for hazard notes QA set on materials, with the standing safety advice. Used by the
 * library item, the planner, the bench sheet and the record, so each says the same words. Nothing when
 * no entry has notes.
 */
export function HazardCaution({ title, entries }: { title: string; entries: HazardEntry[] }) {
  const noted = entries.filter((entry) => entry.notes.trim() !== '');
  if (noted.length === 0) return null;
  return (
    <aside
      aria-label={title}
      className="rounded-md border-l-4 border-caution bg-caution-tint px-4 py-3 text-ink print:border print:bg-transparent"
    >
      <h2 className="font-bold text-caution">
        <span aria-hidden="true">⚠ </span>
        {title}
      </h2>
      <ul className="mt-1 flex flex-col gap-1">
        {noted.map((entry) => (
          <li key={entry.key}>
            {entry.code && noted.length > 1 ? <span className="font-semibold">{entry.code}: </span> : null}
            <span className="whitespace-pre-line">{entry.notes.trim()}</span>
          </li>
        ))}
      </ul>
      <p className="mt-2 text-sm font-semibold">{SAFETY_ADVICE}</p>
    </aside>
  );
}
