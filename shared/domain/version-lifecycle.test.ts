import { describe, expect, it } from 'vitest';
import { PREPARATION_STATUSES, type AllowedActions, type PreparationStatus } from '../contracts/preparations';
import {
  allowedActions,
  allows,
  canEdit,
  canRecordReadings,
  canStartNewVersion,
  canSubmit,
  canWithdraw,
  mayReview,
  OWN_WORK_REVIEW_REFUSAL,
  statusAfterWithdrawal,
  VERSION_TRANSITIONS,
  type LabMember,
  type VersionFacts,
} from './version-lifecycle';

const OWNER = 3;
const owner: LabMember = { id: OWNER, roles: ['analyst'] };
const otherAnalyst: LabMember = { id: 4, roles: ['analyst'] };
const qa: LabMember = { id: 2, roles: ['qa'] };
const auditor: LabMember = { id: 5, roles: ['auditor'] };

/** A computed, latest version of OWNER's preparation, submitted by its owner once it left the draft states. */
const version = (status: PreparationStatus, facts: Partial<VersionFacts> = {}): VersionFacts => ({
  status,
  ownerId: OWNER,
  submitterId: ['submitted', 'approved', 'returned'].includes(status) ? OWNER : null,
  computed: true,
  latest: true,
  readingsRecorded: false,
  ...facts,
});

const PREDICATES = { canEdit, canSubmit, canWithdraw, canRecordReadings, mayReview, canStartNewVersion };
type Predicate = keyof typeof PREDICATES;

/** Every state × predicate: which of owner, other analyst, QA and auditor it lets act (common practice of a review workflow). */
const EXPECTED: Record<PreparationStatus, Record<Predicate, LabMember[]>> = {
  draft: {
    canEdit: [owner],
    canSubmit: [owner],
    canWithdraw: [],
    canRecordReadings: [owner],
    mayReview: [],
    canStartNewVersion: [],
  },
  prepared: {
    canEdit: [],
    canSubmit: [owner],
    canWithdraw: [],
    canRecordReadings: [owner],
    mayReview: [],
    canStartNewVersion: [],
  },
  submitted: {
    canEdit: [],
    canSubmit: [],
    canWithdraw: [owner],
    canRecordReadings: [],
    mayReview: [qa],
    canStartNewVersion: [],
  },
  approved: {
    canEdit: [],
    canSubmit: [],
    canWithdraw: [],
    canRecordReadings: [],
    mayReview: [],
    canStartNewVersion: [owner, otherAnalyst],
  },
  returned: {
    canEdit: [owner],
    canSubmit: [owner],
    canWithdraw: [],
    canRecordReadings: [owner],
    mayReview: [],
    canStartNewVersion: [],
  },
};

describe('version lifecycle table', () => {
  it('covers every state, and every state allows at least one action', () => {
    expect(Object.keys(EXPECTED).sort()).toEqual([...PREPARATION_STATUSES].sort());
    const starts = new Set(Object.values(VERSION_TRANSITIONS).flatMap((t) => [...t.from]));
    expect([...starts].sort()).toEqual([...PREPARATION_STATUSES].sort());
  });

  const cases = PREPARATION_STATUSES.flatMap((status) =>
    (Object.keys(PREDICATES) as Predicate[]).map((predicate): [PreparationStatus, Predicate] => [status, predicate]),
  );
  it.each(cases)('%s: %s lets exactly the expected people act', (status, predicate) => {
    const people = [owner, otherAnalyst, qa, auditor];
    const acting = people.filter((member) => PREDICATES[predicate](member, version(status)));
    expect(acting).toEqual(EXPECTED[status][predicate]);
  });

  it('moves a version only along the table', () => {
    expect(allows('submit', 'prepared')).toBe(true);
    expect(allows('submit', 'submitted')).toBe(false);
    expect(allows('approve', 'returned')).toBe(false);
    expect(allows('recordReadings', 'submitted')).toBe(false);
    expect(VERSION_TRANSITIONS.return.to).toBe('returned');
  });

  it('withdraws a submitted version to prepared when bench readings were recorded on it, else to draft', () => {
    expect(allows('withdraw', 'submitted')).toBe(true);
    expect(statusAfterWithdrawal(version('submitted', { readingsRecorded: true }))).toBe('prepared');
    expect(statusAfterWithdrawal(version('submitted', { readingsRecorded: false }))).toBe('draft');
    expect(VERSION_TRANSITIONS.withdraw.to).toEqual(['draft', 'prepared']);
  });

  it('keeps withdrawal (the owner) apart from return (QA)', () => {
    const submitted = version('submitted');
    expect(canWithdraw(owner, submitted)).toBe(true);
    expect(canWithdraw(qa, submitted)).toBe(false);
    expect(mayReview(owner, submitted)).toBe(false);
    // An owner who lost the planning permission no longer acts on the preparation.
    expect(canWithdraw({ id: OWNER, roles: ['auditor'] }, submitted)).toBe(false);
  });

  it('offers no submission of a version without a computed budget', () => {
    expect(canSubmit(owner, version('draft', { computed: false }))).toBe(false);
    expect(canEdit(owner, version('draft', { computed: false }))).toBe(true);
  });

  it('offers a new version only from the latest approved version', () => {
    expect(canStartNewVersion(owner, version('approved', { latest: false }))).toBe(false);
  });
});

describe('mayReview: QA, and never on their own work', () => {
  const both: LabMember = { id: OWNER, roles: ['analyst', 'qa'] };

  it('refuses the owner who also holds QA', () => {
    expect(mayReview(both, version('submitted'))).toBe(false);
  });

  it('refuses the member of QA who submitted, even when they do not own the preparation', () => {
    // The client's earlier check looked at the owner only and would have offered this reviewer the approval.
    expect(mayReview(qa, version('submitted', { submitterId: qa.id }))).toBe(false);
  });

  it('tells that member of QA why, and nobody else', () => {
    const own = allowedActions(both, version('submitted'));
    expect(own.review).toBe(false);
    expect(own.reviewRefusal).toBe(OWN_WORK_REVIEW_REFUSAL);
    expect(allowedActions(qa, version('submitted')).reviewRefusal).toBeNull();
    expect(allowedActions(owner, version('submitted')).reviewRefusal).toBeNull();
  });

  it('sums up what a member may do in one answer', () => {
    const none: AllowedActions = {
      edit: false,
      submit: false,
      withdraw: false,
      recordReadings: false,
      review: false,
      startNewVersion: false,
      reviewRefusal: null,
    };
    expect(allowedActions(owner, version('draft'))).toEqual({
      ...none,
      edit: true,
      submit: true,
      recordReadings: true,
    });
    expect(allowedActions(qa, version('submitted'))).toEqual({ ...none, review: true });
    expect(allowedActions(owner, version('submitted'))).toEqual({ ...none, withdraw: true });
    expect(allowedActions(auditor, version('approved'))).toEqual(none);
  });
});
