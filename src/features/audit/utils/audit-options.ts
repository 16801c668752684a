/** Action filters of the audit page: a whole family by its prefix, or one action (the API matches by prefix). */
export const ACTION_OPTIONS = [
  { value: '', label: 'All actions' },
  { value: 'auth.', label: 'Sign-ins and passwords' },
  { value: 'member.', label: 'Members and invitations' },
  { value: 'library.', label: 'Tolerance library' },
  { value: 'policy.', label: 'Lab policy' },
  { value: 'preparation.', label: 'Preparations: every action' },
  { value: 'preparation.created', label: 'Preparations: created' },
  { value: 'preparation.computed', label: 'Preparations: computed' },
  { value: 'preparation.submitted', label: 'Preparations: submitted' },
  { value: 'preparation.returned', label: 'Preparations: returned' },
  { value: 'preparation.withdrawn', label: 'Preparations: withdrawn from review' },
  { value: 'preparation.approved', label: 'Preparations: approved' },
  { value: 'preparation.approval_refused', label: 'Preparations: approval refused' },
  { value: 'lab.', label: 'Lab set-up' },
] as const;

/** The kinds of thing an audit event is about. */
export const ENTITY_TYPE_OPTIONS = [
  { value: '', label: 'Anything' },
  { value: 'preparation', label: 'Preparation' },
  { value: 'equipment', label: 'Library item' },
  { value: 'lab_policy', label: 'Lab policy' },
  { value: 'user', label: 'Person' },
  { value: 'invitation', label: 'Invitation' },
  { value: 'lab', label: 'Lab' },
] as const;
