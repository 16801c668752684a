import type { PreparationStatus } from '../../../../shared/contracts/preparations';
import { Badge, type BadgeTone } from '../../../components/ui/badge';
import { STATUS_WORDS } from '../utils/status-words';

const TONES: Record<PreparationStatus, BadgeTone> = {
  draft: 'neutral',
  prepared: 'accent',
  submitted: 'accent',
  approved: 'ok',
  returned: 'caution',
};

export function StatusBadge({ status }: { status: PreparationStatus }) {
  return <Badge tone={TONES[status]}>{STATUS_WORDS[status]}</Badge>;
}
