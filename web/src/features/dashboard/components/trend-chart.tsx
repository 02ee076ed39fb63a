import { makeStyles, tokens } from '@fluentui/react-components';
import { CartesianGrid, Legend, Line, LineChart, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import type { Schema } from '@/lib/api-schemas';
import { formatDate } from '@/lib/format';

const useStyles = makeStyles({
  chart: {
    width: '100%',
    height: '260px',
    margin: 0,
    fontFamily: tokens.fontFamilyBase,
    fontSize: tokens.fontSizeBase200,
  },
});

export interface TrendChartProps {
  readonly trend: readonly Schema<'TrendPointDto'>[];
}

/**
 * Per submittal, by date: findings raised, and how many of those are still open (current items only:
 * one a later revision carried on counts under that revision).
 */
export function TrendChart({ trend }: TrendChartProps) {
  const styles = useStyles();
  const data = trend.map((t) => ({
    label: `#${t.submittalId} · ${formatDate(t.date)}`,
    raised: t.raised,
    open: t.open,
  }));
  const summary = trend
    .map((t) => `Submittal ${t.submittalId}: ${t.raised} raised, ${t.open} still open`)
    .join('. ');
  return (
    <figure className={styles.chart} role="img" aria-label={summary || 'No submittals yet'}>
      <ResponsiveContainer width="100%" height="100%">
        <LineChart data={data} margin={{ top: 8, right: 16, bottom: 8, left: 0 }}>
          <CartesianGrid stroke={tokens.colorNeutralStroke2} strokeDasharray="3 3" vertical={false} />
          {/* The first and the last point always carry their label (recharts would drop the first to
              keep the last when labels crowd), and the padding keeps both inside the chart. */}
          <XAxis
            dataKey="label"
            interval="preserveStartEnd"
            padding={{ left: 40, right: 40 }}
            tick={{ fill: tokens.colorNeutralForeground2 }}
            stroke={tokens.colorNeutralStroke1}
          />
          <YAxis
            allowDecimals={false}
            width={36}
            tick={{ fill: tokens.colorNeutralForeground2 }}
            stroke={tokens.colorNeutralStroke1}
          />
          <Tooltip
            contentStyle={{
              backgroundColor: tokens.colorNeutralBackground1,
              border: `1px solid ${tokens.colorNeutralStroke1}`,
              color: tokens.colorNeutralForeground1,
            }}
          />
          <Legend />
          <Line
            type="linear"
            dataKey="raised"
            name="Raised"
            stroke={tokens.colorNeutralForeground3}
            strokeDasharray="4 3"
            strokeWidth={2}
            isAnimationActive={false}
          />
          <Line
            type="linear"
            dataKey="open"
            name="Still open"
            stroke={tokens.colorBrandForeground1}
            strokeWidth={3}
            isAnimationActive={false}
          />
        </LineChart>
      </ResponsiveContainer>
    </figure>
  );
}
