import type { PreparationStatus } from '../../../../shared/contracts/preparations';

/** Each status in words, as the badges, the list filter and the bench sheet say it. */
export const STATUS_WORDS: Record<PreparationStatus, string> = {
  draft: 'Draft',
  prepared: 'Prepared (readings recorded)',
  submitted: 'Submitted',
  approved: 'Approved',
  returned: 'Returned',
};
