import { Button, Dropdown, Field, Input, makeStyles, Option, tokens } from '@fluentui/react-components';
import { FINDING_CLASSES, findingClassLabels } from '@/lib/finding-classes';
import { STATUSES, statusLabels } from './status-badge';

const useStyles = makeStyles({
  bar: {
    display: 'grid',
    gridTemplateColumns: 'repeat(auto-fit, minmax(150px, 1fr))',
    gap: tokens.spacingHorizontalM,
    alignItems: 'end',
    marginBottom: tokens.spacingVerticalM,
  },
});

export interface FilterValues {
  readonly status: readonly string[];
  readonly class: readonly string[];
  readonly severity: readonly string[];
  readonly memberId: string;
  readonly code: string;
}

export interface DiscrepancyFiltersProps {
  readonly values: FilterValues;
  readonly onChange: (next: Partial<FilterValues>) => void;
  readonly onClear: () => void;
}

const SEVERITIES = ['error', 'warning', 'note'] as const;

function MultiSelect({
  label,
  options,
  labels,
  selected,
  onChange,
}: {
  label: string;
  options: readonly string[];
  labels: Record<string, string>;
  selected: readonly string[];
  onChange: (next: string[]) => void;
}) {
  return (
    <Field label={label}>
      <Dropdown
        multiselect
        placeholder="Any"
        selectedOptions={[...selected]}
        value={selected.map((s) => labels[s] ?? s).join(', ')}
        onOptionSelect={(_, d) => onChange(d.selectedOptions)}
      >
        {options.map((o) => (
          <Option key={o} value={o}>
            {labels[o] ?? o}
          </Option>
        ))}
      </Dropdown>
    </Field>
  );
}

/** Filters the server applies: status (with "open" for raised, answered and returned), class, severity, member and code. */
export function DiscrepancyFilters({ values, onChange, onClear }: DiscrepancyFiltersProps) {
  const styles = useStyles();
  return (
    <div className={styles.bar} role="search" aria-label="Filter discrepancies">
      <MultiSelect
        label="Status"
        options={['open', ...STATUSES]}
        labels={{ open: 'Open', ...statusLabels }}
        selected={values.status}
        onChange={(status) => onChange({ status })}
      />
      <MultiSelect
        label="Class"
        options={FINDING_CLASSES}
        labels={findingClassLabels}
        selected={values.class}
        onChange={(c) => onChange({ class: c })}
      />
      <MultiSelect
        label="Severity"
        options={SEVERITIES}
        labels={{ error: 'Error', warning: 'Warning', note: 'Note' }}
        selected={values.severity}
        onChange={(severity) => onChange({ severity })}
      />
      <Field label="Member">
        <Input
          value={values.memberId}
          placeholder="e.g. SP-1"
          onChange={(_, d) => onChange({ memberId: d.value })}
        />
      </Field>
      <Field label="Code">
        <Input
          value={values.code}
          placeholder="e.g. LG101"
          onChange={(_, d) => onChange({ code: d.value })}
        />
      </Field>
      <Button onClick={onClear}>Clear filters</Button>
    </div>
  );
}
