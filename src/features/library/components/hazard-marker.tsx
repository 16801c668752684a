/** A warning triangle with the word, for materials whose QA hazard notes are set; the notes are its tooltip. */
export function HazardMarker({ notes }: { notes: string }) {
  return (
    <span title={notes} className="inline-flex items-center gap-1 font-semibold whitespace-nowrap text-caution">
      <svg aria-hidden="true" viewBox="0 0 20 18" className="size-4">
        <path d="M10 1 19 17H1z" fill="none" stroke="currentColor" strokeWidth="2" strokeLinejoin="round" />
        <path d="M10 7v4.5M10 13.5v1" stroke="currentColor" strokeWidth="2" strokeLinecap="round" />
      </svg>
      Hazard
    </span>
  );
}
