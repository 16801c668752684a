import { Button } from '../../../components/ui/button';
import { Select } from '../../../components/ui/select';
import { TextField } from '../../../components/ui/text-field';
import { newKey, type DraftExtraSource, type ExtraSourceShape } from '../utils/plan-draft';

const SHAPES: { value: ExtraSourceShape; label: string }[] = [
  { value: 'normal', label: 'Normal (standard uncertainty u)' },
  { value: 'rectangular', label: 'Rectangular (half-width a)' },
  { value: 'triangular', label: 'Triangular (half-width a)' },
  { value: 'arcsine', label: 'U-shaped (half-width a)' },
];

type ExtraSourcesEditorProps = {
  stepNumber: number;
  /** The step's own quantity unit, for absolute sources ("g", "mL", the certificate's unit). */
  absoluteUnit: string;
  sources: DraftExtraSource[];
  onChange: (sources: DraftExtraSource[]) => void;
  errorAt: (sourceIndex: number) => string | undefined;
};

/** Named sources the analyst adds to a step (evaporation, adsorption on the glass…). */
export function ExtraSourcesEditor({ stepNumber, absoluteUnit, sources, onChange, errorAt }: ExtraSourcesEditorProps) {
  const update = (index: number, change: Partial<DraftExtraSource>) =>
    onChange(sources.map((source, at) => (at === index ? { ...source, ...change } : source)));
  return (
    <div className="mt-3">
      {sources.map((source, index) => {
        const error = errorAt(index);
        return (
          <fieldset
            key={source.key}
            className="mb-2 grid items-end gap-2 rounded-md border border-line p-3 md:grid-cols-[2fr_1.2fr_2fr_1.2fr_auto]"
          >
            <legend className="px-1 text-sm font-semibold text-muted">
              Extra source {index + 1} of step {stepNumber}
            </legend>
            <TextField
              label="Name"
              value={source.name}
              onChange={(event) => update(index, { name: event.target.value })}
              placeholder="e.g. evaporation"
            />
            <Select
              label="Acts on"
              value={source.effect}
              onChange={(event) => update(index, { effect: event.target.value as DraftExtraSource['effect'] })}
              options={[
                { value: 'relative', label: 'Relative (× 1 + δ)' },
                { value: 'absolute', label: `Absolute (${absoluteUnit})` },
              ]}
            />
            <Select
              label="Distribution"
              value={source.shape}
              onChange={(event) => update(index, { shape: event.target.value as ExtraSourceShape })}
              options={SHAPES}
            />
            <TextField
              label="Width"
              unit={source.effect === 'relative' ? 'fraction' : absoluteUnit}
              inputMode="decimal"
              value={source.amount}
              onChange={(event) => update(index, { amount: event.target.value })}
              placeholder={source.effect === 'relative' ? '0.0005' : ''}
            />
            <Button
              variant="quiet"
              size="small"
              onClick={() => onChange(sources.filter((_, at) => at !== index))}
              aria-label={`Remove extra source ${index + 1} of step ${stepNumber}`}
            >
              Remove
            </Button>
            {error ? <p className="text-sm font-semibold text-danger md:col-span-5">{error}</p> : null}
          </fieldset>
        );
      })}
      <Button
        variant="secondary"
        size="small"
        onClick={() =>
          onChange([
            ...sources,
            { key: newKey('source'), name: '', effect: 'relative', shape: 'rectangular', amount: '' },
          ])
        }
      >
        Add a source to step {stepNumber}
      </Button>
    </div>
  );
}
