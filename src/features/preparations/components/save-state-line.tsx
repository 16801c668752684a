import type { SaveState } from '../hooks/use-autosave';

const timeFormat = new Intl.DateTimeFormat('en-GB', { hour: '2-digit', minute: '2-digit' });

/** "Saved at 10:42", "Saving…", "Not saved: <reason>", announced politely. */
export function SaveStateLine({ state }: { state: SaveState }) {
  const words =
    state.phase === 'unsaved'
      ? 'Not saved yet: it saves itself once the plan can be computed'
      : state.phase === 'saved'
        ? state.at
          ? `Saved at ${timeFormat.format(state.at)}`
          : 'Saved'
        : state.phase === 'saving'
          ? 'Saving…'
          : state.phase === 'waiting'
            ? 'Changes not saved yet…'
            : `Not saved: ${state.reason}`;
  const tone = state.phase === 'failed' ? 'text-danger' : state.phase === 'saved' ? 'text-ok' : 'text-muted';
  return (
    <p role="status" className={`text-sm font-semibold ${tone}`} data-testid="save-state">
      {state.phase === 'saved' ? <span aria-hidden="true">✓ </span> : null}
      {words}
    </p>
  );
}
