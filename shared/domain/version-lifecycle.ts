import { can } from '../contracts/permissions';
import type { AllowedActions, PreparationStatus } from '../contracts/preparations';
import type { Role } from '../contracts/roles';

/**
 * The life of a preparation version, the one home of its rules: which states allow
 * which action, and who may act. The server refuses every change through this table; it also computes
 * `allowedActions` from it for the signed-in member, and the client shows or hides actions from that.
 *
 *   draft ──edit──▶ draft          returned ──edit──▶ returned
 *   draft | returned | prepared ──recordReadings──▶ prepared
 *   draft | prepared | returned ──submit──▶ submitted
 *   submitted ──approve──▶ approved          submitted ──return──▶ returned
 *   submitted ──withdraw──▶ prepared (bench readings recorded) or draft (none)
 *   approved (the latest version) ──startNewVersion──▶ a new draft version; the approved one never changes
 */
export const VERSION_TRANSITIONS = {
  /** The plan is saved and recomputed; the version keeps its state. */
  edit: { from: ['draft', 'returned'], to: null },
  /** Masses weighed at the bench replace the planned ones; they may be corrected until submission. */
  recordReadings: { from: ['draft', 'returned', 'prepared'], to: 'prepared' },
  submit: { from: ['draft', 'prepared', 'returned'], to: 'submitted' },
  approve: { from: ['submitted'], to: 'approved' },
  /** QA sends a submitted version back to its analyst with comments. */
  return: { from: ['submitted'], to: 'returned' },
  /** Its analyst takes a submitted version back before QA decides; `statusAfterWithdrawal` picks where to. */
  withdraw: { from: ['submitted'], to: ['draft', 'prepared'] },
  /** Starts the next version (a draft); this one keeps its state. */
  startNewVersion: { from: ['approved'], to: null },
} as const satisfies Record<
  string,
  { from: readonly PreparationStatus[]; to: PreparationStatus | readonly PreparationStatus[] | null }
>;

type VersionTransition = keyof typeof VERSION_TRANSITIONS;

/** The states a transition may start from. */
export const statesAllowing = (transition: VersionTransition): readonly PreparationStatus[] =>
  VERSION_TRANSITIONS[transition].from;

/** True when a version in `status` may go through `transition`. */
export function allows(transition: VersionTransition, status: PreparationStatus): boolean {
  return statesAllowing(transition).includes(status);
}

/** What the rules need to know about a version. */
export interface VersionFacts {
  status: PreparationStatus;
  /** The user who owns the preparation (its analyst). */
  ownerId: number;
  /** Who submitted the version last, or null when it never was. */
  submitterId: number | null;
  /** The version has a computed budget (a plan with a problem has none). */
  computed: boolean;
  /** The version is the preparation's latest one. */
  latest: boolean;
  /** Masses weighed at the bench were recorded on the version. */
  readingsRecorded: boolean;
}

/** A signed-in member of the version's lab. */
export interface LabMember {
  id: number;
  roles: readonly Role[];
}

/** Only the analyst who owns a preparation changes it, records its readings and submits it. */
export const ownsPreparation = (member: Pick<LabMember, 'id'>, version: Pick<VersionFacts, 'ownerId'>) =>
  member.id === version.ownerId;

/** Separation of duties: whoever owns or submitted a version never reviews it. */
export const isOwnWork = (member: Pick<LabMember, 'id'>, version: Pick<VersionFacts, 'ownerId' | 'submitterId'>) =>
  member.id === version.ownerId || member.id === version.submitterId;

/** What QA is told, and what the server answers, when a member would review their own version. */
export const OWN_WORK_REVIEW_REFUSAL = 'You submitted this version; another member of QA must review it.';

const ownerPlanning = (member: LabMember, version: VersionFacts) =>
  can(member.roles, 'planPreparations') && ownsPreparation(member, version);

/** The owner may change the plan of a draft or returned version. */
export const canEdit = (member: LabMember, version: VersionFacts) =>
  ownerPlanning(member, version) && allows('edit', version.status);

/** The owner may submit a computed draft, prepared or returned version for review. */
export const canSubmit = (member: LabMember, version: VersionFacts) =>
  ownerPlanning(member, version) && version.computed && allows('submit', version.status);

/**
 * The owner may take a submitted version back out of review while QA has not decided (a submitted version
 * has no decision since its last submission); QA's own way to send it back is `return`, through mayReview.
 */
export const canWithdraw = (member: LabMember, version: VersionFacts) =>
  ownerPlanning(member, version) && allows('withdraw', version.status);

/** The states a withdrawn version may go back to. */
export type WithdrawnStatus = (typeof VERSION_TRANSITIONS.withdraw.to)[number];

/** Where a withdrawn version goes back to: prepared when bench readings were recorded on it, else draft. */
export const statusAfterWithdrawal = (version: Pick<VersionFacts, 'readingsRecorded'>): WithdrawnStatus =>
  version.readingsRecorded ? 'prepared' : 'draft';

/** The owner may record (or correct) the masses weighed until the version is submitted. */
export const canRecordReadings = (member: LabMember, version: VersionFacts) =>
  ownerPlanning(member, version) && allows('recordReadings', version.status);

/** A member of QA who neither owns nor submitted a submitted version may approve or return it. */
export function mayReview(member: LabMember, version: VersionFacts): boolean {
  return can(member.roles, 'reviewRecords') && allows('approve', version.status) && !isOwnWork(member, version);
}

/** Any analyst may start the next version from the latest version once it is approved. */
export const canStartNewVersion = (member: LabMember, version: VersionFacts) =>
  can(member.roles, 'planPreparations') && version.latest && allows('startNewVersion', version.status);

/** What `member` may do with `version` now: sent by the server with every version. */
export function allowedActions(member: LabMember, version: VersionFacts): AllowedActions {
  const ownReview =
    can(member.roles, 'reviewRecords') && allows('approve', version.status) && isOwnWork(member, version);
  return {
    edit: canEdit(member, version),
    submit: canSubmit(member, version),
    withdraw: canWithdraw(member, version),
    recordReadings: canRecordReadings(member, version),
    review: mayReview(member, version),
    startNewVersion: canStartNewVersion(member, version),
    reviewRefusal: ownReview ? OWN_WORK_REVIEW_REFUSAL : null,
  };
}
