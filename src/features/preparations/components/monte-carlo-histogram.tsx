import { Area, CartesianGrid, ComposedChart, Line, ReferenceLine, ResponsiveContainer, XAxis, YAxis } from 'recharts';
import type { Budget } from '../../../../shared/contracts/snapshot';
import type { MonteCarloResult } from '../../../../shared/uncertainty';
import { formatSignificant } from '../utils/format-number';

type HistogramProps = { monteCarlo: MonteCarloResult; budget: Budget };

/** The line style of each interval end, drawn in the chart and in its key (dash patterns, not colour alone). */
const INTERVAL_STYLES = {
  gum: { label: 'GUM y ± U', dash: '8 4', color: '#a85a24' },
  symmetric: { label: 'Monte Carlo, probabilistically symmetric', dash: undefined, color: '#17323b' },
  shortest: { label: 'Monte Carlo, shortest', dash: '2 3', color: '#2f6b4f' },
} as const;

/**
 * The Monte Carlo histogram (hatched steps) with the GUM's normal density N(y, u_c²) scaled to the counts
 * (M·w·φ) as a dashed curve, and the ends of the three coverage intervals as vertical lines.
 */
export default function MonteCarloHistogram({ monteCarlo, budget }: HistogramProps) {
  const { lowerEdge, binWidth, counts } = monteCarlo.histogram;
  const u = budget.standardUncertainty;
  const density = (x: number) =>
    (monteCarlo.trials * binWidth * Math.exp(-0.5 * ((x - budget.value) / u) ** 2)) / (u * Math.sqrt(2 * Math.PI));
  // Each bin is drawn from its lower edge to the next (stepAfter); the density is sampled at the same x.
  const data = [...counts, 0].map((count, index) => {
    const x = lowerEdge + index * binWidth;
    return { x, count, gum: density(x) };
  });
  const lines: { key: string; x: number; style: (typeof INTERVAL_STYLES)[keyof typeof INTERVAL_STYLES] }[] = [
    { key: 'gum-low', x: budget.value - budget.expandedUncertainty, style: INTERVAL_STYLES.gum },
    { key: 'gum-high', x: budget.value + budget.expandedUncertainty, style: INTERVAL_STYLES.gum },
    { key: 'sym-low', x: monteCarlo.symmetricInterval.low, style: INTERVAL_STYLES.symmetric },
    { key: 'sym-high', x: monteCarlo.symmetricInterval.high, style: INTERVAL_STYLES.symmetric },
    { key: 'short-low', x: monteCarlo.shortestInterval.low, style: INTERVAL_STYLES.shortest },
    { key: 'short-high', x: monteCarlo.shortestInterval.high, style: INTERVAL_STYLES.shortest },
  ];
  const low = Math.min(lowerEdge, ...lines.map((line) => line.x));
  const high = Math.max(lowerEdge + counts.length * binWidth, ...lines.map((line) => line.x));
  const digits = (value: number) => formatSignificant(value, 5);
  const unit = budget.unit;

  return (
    <figure className="min-w-0">
      <figcaption className="mb-1 font-semibold">
        Monte Carlo distribution of {monteCarlo.measurand} ({monteCarlo.trials.toLocaleString('en-GB')} trials) with the
        GUM result
      </figcaption>
      <div aria-hidden="true">
        <ResponsiveContainer width="100%" height={280} initialDimension={{ width: 640, height: 280 }}>
          <ComposedChart data={data} margin={{ top: 8, right: 16, bottom: 24, left: 8 }}>
            <defs>
              <pattern
                id="histogram-hatch"
                width="6"
                height="6"
                patternUnits="userSpaceOnUse"
                patternTransform="rotate(45)"
              >
                <rect width="6" height="6" fill="#e8ecec" />
                <line x1="0" y1="0" x2="0" y2="6" stroke="#55676d" strokeWidth="2" />
              </pattern>
            </defs>
            <CartesianGrid vertical={false} strokeDasharray="2 4" />
            <XAxis
              dataKey="x"
              type="number"
              domain={[low, high]}
              tickFormatter={(value: number) => formatSignificant(value, 5)}
              tick={{ fontSize: 12 }}
              label={{
                value: `${monteCarlo.measurand} (${unit})`,
                position: 'insideBottom',
                offset: -16,
                fontSize: 12,
              }}
            />
            <YAxis tick={{ fontSize: 12 }} width={56} tickFormatter={(value: number) => formatSignificant(value, 2)} />
            <Area
              type="stepAfter"
              dataKey="count"
              stroke="#55676d"
              fill="url(#histogram-hatch)"
              isAnimationActive={false}
            />
            <Line
              type="monotone"
              dataKey="gum"
              stroke="#a85a24"
              strokeWidth={2}
              strokeDasharray="6 3"
              dot={false}
              isAnimationActive={false}
            />
            {lines.map((line) => (
              <ReferenceLine
                key={line.key}
                x={line.x}
                stroke={line.style.color}
                strokeWidth={2}
                strokeDasharray={line.style.dash}
              />
            ))}
          </ComposedChart>
        </ResponsiveContainer>
      </div>
      <ul className="mt-1 flex flex-wrap gap-x-5 gap-y-1 text-sm" aria-hidden="true">
        <li className="inline-flex items-center gap-2">
          <svg width="28" height="12">
            <rect width="28" height="12" fill="url(#histogram-hatch)" stroke="#55676d" />
          </svg>
          Monte Carlo histogram
        </li>
        <li className="inline-flex items-center gap-2">
          <svg width="28" height="12">
            <line x1="0" y1="6" x2="28" y2="6" stroke="#a85a24" strokeWidth="2" strokeDasharray="6 3" />
          </svg>
          GUM normal density
        </li>
        {Object.values(INTERVAL_STYLES).map((style) => (
          <li key={style.label} className="inline-flex items-center gap-2">
            <svg width="12" height="16">
              <line x1="6" y1="0" x2="6" y2="16" stroke={style.color} strokeWidth="2" strokeDasharray={style.dash} />
            </svg>
            {style.label}
          </li>
        ))}
      </ul>
      <table className="sr-only">
        <caption>
          Coverage intervals of {monteCarlo.measurand}, in {unit}
        </caption>
        <thead>
          <tr>
            <th scope="col">Interval</th>
            <th scope="col">Low end</th>
            <th scope="col">High end</th>
          </tr>
        </thead>
        <tbody>
          <tr>
            <th scope="row">{INTERVAL_STYLES.gum.label}</th>
            <td>{digits(budget.value - budget.expandedUncertainty)}</td>
            <td>{digits(budget.value + budget.expandedUncertainty)}</td>
          </tr>
          <tr>
            <th scope="row">{INTERVAL_STYLES.symmetric.label}</th>
            <td>{digits(monteCarlo.symmetricInterval.low)}</td>
            <td>{digits(monteCarlo.symmetricInterval.high)}</td>
          </tr>
          <tr>
            <th scope="row">{INTERVAL_STYLES.shortest.label}</th>
            <td>{digits(monteCarlo.shortestInterval.low)}</td>
            <td>{digits(monteCarlo.shortestInterval.high)}</td>
          </tr>
        </tbody>
      </table>
    </figure>
  );
}
