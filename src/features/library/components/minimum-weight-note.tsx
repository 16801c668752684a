import { minimumWeightText } from '../../../../shared/contracts/balance-reading';
import { formatQuantity } from '../utils/format-quantity';

/** A balance's USP <41> minimum net weight, with the rule it comes from. */
export function MinimumWeightNote({ minimumWeightG }: { minimumWeightG: number }) {
  return (
    <section aria-labelledby="minimum-weight-heading" className="rounded-md border border-line bg-paper px-4 py-3">
      <h2 id="minimum-weight-heading" className="font-bold">
        Minimum weight: <span className="numeric">{minimumWeightText(minimumWeightG)}</span> (
        {formatQuantity(Number((minimumWeightG * 1000).toPrecision(3)))} mg)
      </h2>
      <p className="text-sm text-muted">
        USP &lt;41&gt;: a net mass m is fit to weigh when 2·s/m ≤ 0.10 %, with the repeatability s taken as at least
        0.41·d; so m ≥ 2000·s.
      </p>
    </section>
  );
}
