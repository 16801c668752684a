/**
 * The safety words every screen, bench sheet and PDF shows beside hazardous work. One home, so the
 * screen and the signed record say the same thing (common practice: defer to the safety data sheet,
 * the lab's own hygiene plan and local rules).
 */
export const SAFETY_ADVICE =
  'Follow the safety data sheet of every material, the laboratory’s chemical hygiene plan and local regulations.';

/** Why the cautions are there at all: the analytes and the acids they are kept in. */
export const TOXIC_WORK_CAUTION =
  'Many analytes prepared with this record are toxic (for example lead, arsenic, mercury, cadmium, chromium(VI)), and stock solutions are usually made in strong acid.';

/** What the tool decides and what it leaves to the lab. */
export const LAB_DECIDES = 'Dilutrace computes; the laboratory’s accredited procedures and its quality system decide.';

/** The cautions a signed record carries, in print. */
export const RECORD_CAUTIONS = [TOXIC_WORK_CAUTION, SAFETY_ADVICE, LAB_DECIDES] as const;
