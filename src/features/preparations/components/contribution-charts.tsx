import { memo } from 'react';
import { Bar, BarChart, CartesianGrid, LabelList, ResponsiveContainer, XAxis, YAxis } from 'recharts';
import type { BudgetGroup } from '../../../../shared/uncertainty';
import { categoryWords } from '../utils/source-category-words';

type ContributionChartsProps = {
  byStep: BudgetGroup[];
  byCategory: BudgetGroup[];
  stepName: (key: string) => string;
  /** Draws the bars in grey while the plan has a problem and this is the last valid budget. */
  stale: boolean;
};

const percentLabel = (value: unknown) => `${Number(value).toFixed(1)} %`;

function ShareChart({
  title,
  groups,
  nameOf,
  stale,
}: {
  title: string;
  groups: BudgetGroup[];
  nameOf: (key: string) => string;
  stale: boolean;
}) {
  const data = [...groups]
    .sort((a, b) => b.indexPercent - a.indexPercent)
    .map((group) => ({ name: nameOf(group.key), percent: group.indexPercent }));
  const height = 40 + data.length * 34;
  const summary = data.map((entry) => `${entry.name}: ${entry.percent.toFixed(1)} %`).join('; ');
  return (
    <figure className="min-w-0">
      <figcaption className="mb-1 font-semibold">{title}</figcaption>
      <div aria-hidden="true">
        <ResponsiveContainer width="100%" height={height} initialDimension={{ width: 480, height }}>
          <BarChart data={data} layout="vertical" margin={{ top: 4, right: 56, bottom: 4, left: 8 }}>
            <CartesianGrid horizontal={false} strokeDasharray="2 4" />
            <XAxis type="number" domain={[0, 100]} unit=" %" tick={{ fontSize: 12 }} />
            <YAxis type="category" dataKey="name" width={190} tick={{ fontSize: 12 }} interval={0} />
            <Bar dataKey="percent" fill={stale ? '#8f877a' : '#2a4a54'} isAnimationActive={false}>
              <LabelList
                dataKey="percent"
                position="right"
                formatter={percentLabel}
                style={{ fontSize: 12, fill: '#17323b' }}
              />
            </Bar>
          </BarChart>
        </ResponsiveContainer>
      </div>
      <p className="sr-only">
        {title}, share of the variance: {summary}.
      </p>
    </figure>
  );
}

/** Where the variance comes from: per step and per source type, largest first, each bar labelled with its share. */
function ContributionCharts({ byStep, byCategory, stepName, stale }: ContributionChartsProps) {
  return (
    <div className={`grid gap-6 ${stale ? 'opacity-60' : ''}`}>
      <ShareChart title="Share of the variance by step" groups={byStep} nameOf={stepName} stale={stale} />
      <ShareChart
        title="Share of the variance by source type"
        groups={byCategory}
        nameOf={categoryWords}
        stale={stale}
      />
    </div>
  );
}

export default memo(ContributionCharts);
