import { Bar, BarChart, CartesianGrid, LabelList, Legend, ResponsiveContainer, XAxis, YAxis } from 'recharts';

/** Fills that differ in pattern as well as shade, so the variants stay apart in grey print. */
const FILLS = [
  { id: 'variant-solid', fill: '#2a4a54' },
  { id: 'variant-hatch', fill: 'url(#variant-hatch)' },
  { id: 'variant-dots', fill: 'url(#variant-dots)' },
  { id: 'variant-light', fill: '#c9b9a6' },
];

type CompareChartProps = {
  /** One entry per budget group ("Step 1", "Shared by steps 2 and 4"), with each variant's (uᵢ(y)/y)² in %². */
  data: Record<string, string | number>[];
  variants: { key: string; label: string }[];
};

/** Each step's contribution to the relative variance, variant beside variant; the bars carry their values. */
export default function CompareChart({ data, variants }: CompareChartProps) {
  return (
    <ResponsiveContainer width="100%" height={320} initialDimension={{ width: 900, height: 320 }}>
      <BarChart data={data} margin={{ top: 16, right: 16, bottom: 8, left: 8 }}>
        <defs>
          <pattern id="variant-hatch" width="6" height="6" patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
            <rect width="6" height="6" fill="#f4e6da" />
            <line x1="0" y1="0" x2="0" y2="6" stroke="#8f4a1b" strokeWidth="2.5" />
          </pattern>
          <pattern id="variant-dots" width="6" height="6" patternUnits="userSpaceOnUse">
            <rect width="6" height="6" fill="#e3efe8" />
            <circle cx="3" cy="3" r="1.6" fill="#2f6b4f" />
          </pattern>
        </defs>
        <CartesianGrid vertical={false} strokeDasharray="2 4" />
        <XAxis dataKey="step" tick={{ fontSize: 12 }} />
        <YAxis unit=" %²" tick={{ fontSize: 12 }} width={72} />
        <Legend />
        {variants.map((variant, index) => (
          <Bar
            key={variant.key}
            dataKey={variant.key}
            name={variant.label}
            fill={FILLS[index % FILLS.length].fill}
            stroke="#17323b"
            isAnimationActive={false}
          >
            <LabelList
              dataKey={variant.key}
              position="top"
              formatter={(value: unknown) => (typeof value === 'number' ? Number(value.toPrecision(2)).toString() : '')}
              style={{ fontSize: 11, fill: '#17323b' }}
            />
          </Bar>
        ))}
      </BarChart>
    </ResponsiveContainer>
  );
}
