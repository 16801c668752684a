import type { Response } from 'express';

/**
 * An AbortSignal that aborts when the client goes away before its answer is sent (the connection
 * closes first), so the work done for it can stop.
 */
export function clientSignal(res: Response): AbortSignal {
  const controller = new AbortController();
  res.once('close', () => {
    if (!res.writableFinished) controller.abort(new Error('The client closed the request.'));
  });
  return controller.signal;
}
