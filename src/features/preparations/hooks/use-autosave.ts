import { useEffect, useRef, useState } from 'react';
import type { PreparationDetail, PreparationWrite } from '../../../../shared/contracts/preparations';
import { isApiError } from '../../../lib/api-error';

/** How long after the last change a draft is saved. */
export const AUTOSAVE_DELAY_MS = 1500;

export type SaveState =
  | { phase: 'unsaved' }
  | { phase: 'saved'; at: Date | null }
  | { phase: 'waiting' }
  | { phase: 'saving' }
  | { phase: 'failed'; reason: string };

/**
 * Saves the draft AUTOSAVE_DELAY_MS after the last change, one request at a time (a change made
 * while saving is saved right after). `write` null means "nothing to save yet" with `blocked` as
 * the reason shown; `save` is the PUT of the draft (or the first POST on a new preparation).
 */
export function useAutosave(input: {
  write: PreparationWrite | null;
  blocked: string | null;
  enabled: boolean;
  save: (write: PreparationWrite) => Promise<PreparationDetail>;
  /** Called with the server's answer and the key of the write it holds now. */
  onSaved?: (detail: PreparationDetail, savedKey: string) => void;
  /** The write as loaded from the server, which needs no saving. */
  initialKey: string | null;
}) {
  const { write, blocked, enabled } = input;
  const key = write ? JSON.stringify(write) : null;
  // A preparation loaded from the server is saved as it stands; a new one has nothing saved yet.
  const [state, setState] = useState<SaveState>(
    input.initialKey === null ? { phase: 'unsaved' } : { phase: 'saved', at: null },
  );
  const savedKey = useRef<string | null>(input.initialKey);
  const inFlight = useRef(false);
  const latest = useRef({ write, key, save: input.save, onSaved: input.onSaved });
  latest.current = { write, key, save: input.save, onSaved: input.onSaved };

  const saveNow = useRef(async () => {
    const { write: current, key: currentKey, save, onSaved } = latest.current;
    if (!current || currentKey === savedKey.current) return;
    if (inFlight.current) return;
    inFlight.current = true;
    setState({ phase: 'saving' });
    try {
      const detail = await save(current);
      savedKey.current = currentKey;
      inFlight.current = false;
      setState({ phase: 'saved', at: new Date() });
      onSaved?.(detail, currentKey as string);
      // Typed while the request was out: save that too.
      if (latest.current.key !== currentKey) void saveNow.current();
    } catch (error) {
      inFlight.current = false;
      setState({ phase: 'failed', reason: isApiError(error) ? error.message : 'the server could not be reached' });
    }
  });

  useEffect(() => {
    if (!enabled || key === savedKey.current) return;
    if (key === null) {
      // eslint-disable-next-line react-hooks/set-state-in-effect -- the state follows the autosave timer, an outside system
      setState(blocked ? { phase: 'failed', reason: blocked } : { phase: 'waiting' });
      return;
    }
    setState({ phase: 'waiting' });
    const timer = setTimeout(() => void saveNow.current(), AUTOSAVE_DELAY_MS);
    return () => clearTimeout(timer);
  }, [key, blocked, enabled]);

  return state;
}
