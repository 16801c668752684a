/** The caution box for a reference material's hazard notes, with the standing advice (safety data sheet, chemical hygiene plan, local rules). */
export function HazardCaution({ notes }: { notes: string }) {
  return (
    <aside
      aria-labelledby="hazard-heading"
      className="rounded-md border-l-4 border-caution bg-caution-tint px-4 py-3 text-ink"
    >
      <h2 id="hazard-heading" className="font-bold text-caution">
        Caution: hazardous material
      </h2>
      <p className="whitespace-pre-line">{notes}</p>
      <p className="mt-2 font-semibold">
        Follow the safety data sheet, your lab's chemical hygiene plan and local regulations.
      </p>
    </aside>
  );
}
