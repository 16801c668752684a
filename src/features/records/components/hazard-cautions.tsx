import type { UsedItem } from '../../../../shared/contracts/snapshot';

/** The hazard notes QA set on the materials used, with the standing advice; nothing when none has notes. */
export function HazardCautions({ items }: { items: UsedItem[] }) {
  const hazardous = items.filter((item) => item.hazardNotes.trim() !== '');
  if (hazardous.length === 0) return null;
  return (
    <aside
      aria-labelledby="hazard-heading"
      className="rounded-md border-l-4 border-caution bg-caution-tint px-4 py-3 text-ink"
    >
      <h2 id="hazard-heading" className="font-bold text-caution">
        Caution: hazardous materials
      </h2>
      <ul className="mt-1 flex flex-col gap-1">
        {hazardous.map((item) => (
          <li key={item.revisionId}>
            <span className="font-semibold">{item.code}:</span>{' '}
            <span className="whitespace-pre-line">{item.hazardNotes.trim()}</span>
          </li>
        ))}
      </ul>
      <p className="mt-2 font-semibold">
        Follow the safety data sheet, your lab's chemical hygiene plan and local regulations.
      </p>
    </aside>
  );
}
