import { warningText } from '../../../../shared/contracts/warning-text';
import type { StoredWarning } from '../../../../shared/contracts/warnings';
import { Alert } from '../../../components/ui/alert';

/** The warnings stored with a version's budget, in the same words as the PDF record (warning-text.ts). */
export function RecordedWarnings({ warnings }: { warnings: StoredWarning[] }) {
  if (warnings.length === 0) return null;
  return (
    <Alert tone="info" title="Warnings recorded with the budget">
      <ul className="list-disc pl-5">
        {warnings.map(warningText).map((text) => (
          <li key={text}>{text}</li>
        ))}
      </ul>
    </Alert>
  );
}
