/** One step in the path to the offending field of a plan, e.g. ['steps', 2, 'volumeMl']. */
export type PlanPathSegment = string | number;

/**
 * The engine's own error: an invalid plan or an impossible request.
 * `path` points at the offending field; `message` is written for a chemist.
 *
 * @example
 * throw new PlanError(['steps', 2, 'volumeMl'], 'The aliquot (25 mL) is larger than the flask it comes from (10 mL).');
 */
export class PlanError extends Error {
  readonly path: PlanPathSegment[];

  constructor(path: PlanPathSegment[], message: string) {
    super(message);
    this.name = 'PlanError';
    this.path = [...path];
  }
}
