import { makeStyles, tokens } from '@fluentui/react-components';
import type { FindingClass } from 'ligament/engine';
import { Bar, BarChart, CartesianGrid, Legend, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import {
  FINDING_CLASSES,
  findingClassColours,
  findingClassLabels,
  findingClassRank,
} from '@/lib/finding-classes';

const useStyles = makeStyles({
  chart: {
    width: '100%',
    height: '280px',
    fontFamily: tokens.fontFamilyBase,
    fontSize: tokens.fontSizeBase200,
  },
});

export interface RevisionCounts {
  readonly label: string;
  readonly counts: Partial<Record<FindingClass, number>>;
}

export interface OpenFindingsChartProps {
  readonly revisions: readonly RevisionCounts[];
  /** Text alternative: the same numbers as a sentence for screen readers. */
  readonly summary: string;
}

/** Stacked bars: open findings by class, one bar per revision, oldest first. */
export function OpenFindingsChart({ revisions, summary }: OpenFindingsChartProps) {
  const styles = useStyles();
  const data = revisions.map((r) => ({ label: r.label, ...r.counts }));
  const present = FINDING_CLASSES.filter((c) => revisions.some((r) => (r.counts[c] ?? 0) > 0));
  return (
    <figure className={styles.chart} aria-label={summary} role="img" style={{ margin: 0 }}>
      <ResponsiveContainer width="100%" height="100%">
        <BarChart data={data} margin={{ top: 8, right: 16, bottom: 8, left: 0 }}>
          <CartesianGrid stroke={tokens.colorNeutralStroke2} strokeDasharray="3 3" vertical={false} />
          <XAxis
            dataKey="label"
            tick={{ fill: tokens.colorNeutralForeground2 }}
            stroke={tokens.colorNeutralStroke1}
          />
          <YAxis
            allowDecimals={false}
            tick={{ fill: tokens.colorNeutralForeground2 }}
            stroke={tokens.colorNeutralStroke1}
            width={36}
          />
          <Tooltip
            cursor={{ fill: tokens.colorNeutralBackground1Hover }}
            contentStyle={{
              backgroundColor: tokens.colorNeutralBackground1,
              border: `1px solid ${tokens.colorNeutralStroke1}`,
              borderRadius: tokens.borderRadiusMedium,
              color: tokens.colorNeutralForeground1,
            }}
            labelStyle={{ color: tokens.colorNeutralForeground1, fontWeight: 600 }}
            itemSorter={(item) => findingClassRank(item.dataKey)}
          />
          {/* Legend and tooltip follow the class chips' reading order, not recharts' alphabetical default. */}
          <Legend
            itemSorter={(item) => findingClassRank(item.dataKey)}
            formatter={(value: string) => (
              <span style={{ color: tokens.colorNeutralForeground2 }}>{value}</span>
            )}
          />
          {present.map((c) => (
            <Bar
              key={c}
              dataKey={c}
              name={findingClassLabels[c]}
              stackId="open"
              fill={findingClassColours[c]}
              isAnimationActive={false}
            />
          ))}
        </BarChart>
      </ResponsiveContainer>
    </figure>
  );
}
