/** The standing advice shown beside every hazard note. */
export const SAFETY_LINE = 'Follow the safety data sheet, your lab’s chemical hygiene plan and local regulations.';

/** A material's hazard notes with the safety line, wherever the material is used. */
export function HazardNotes({ code, notes }: { code: string; notes: string }) {
  if (!notes) return null;
  return (
    <aside
      aria-label={`Hazards of ${code}`}
      className="rounded-md border-l-4 border-caution bg-caution-tint px-4 py-3 text-ink print:border print:bg-transparent"
    >
      <p className="font-bold text-caution">
        <span aria-hidden="true">⚠ </span>Hazards of {code}
      </p>
      <p>{notes}</p>
      <p className="mt-1 text-sm font-semibold">{SAFETY_LINE}</p>
    </aside>
  );
}
