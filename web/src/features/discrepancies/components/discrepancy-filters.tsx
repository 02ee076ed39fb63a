import { Button, Dropdown, Field, Input, makeStyles, Option, tokens } from '@fluentui/react-components';
import { FINDING_CLASSES, findingClassLabels } from '@/lib/finding-classes';
import { STATUSES, statusLabels } from './status-badge';

const useStyles = makeStyles({
  bar: {
    display: 'flex',
    flexWrap: 'wrap',
    columnGap: tokens.spacingHorizontalM,
    rowGap: tokens.spacingVerticalS,
    alignItems: 'flex-end',
    marginBottom: tokens.spacingVerticalM,
  },
  choice: { flexGrow: 2, flexShrink: 1, flexBasis: '200px', minWidth: 0 },
  text: { flexGrow: 1, flexShrink: 1, flexBasis: '120px', minWidth: 0 },
  // Fluent's Dropdown keeps a wide min-width of its own; the field decides the width here.
  control: { minWidth: 0, width: '100%' },
  clear: { flexGrow: 0, flexShrink: 0 },
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
  const styles = useStyles();
  return (
    <Field label={label} className={styles.choice}>
      <Dropdown
        multiselect
        className={styles.control}
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
      <Field label="Member" className={styles.text}>
        <Input
          className={styles.control}
          value={values.memberId}
          placeholder="e.g. SP-1"
          onChange={(_, d) => onChange({ memberId: d.value })}
        />
      </Field>
      <Field label="Code" className={styles.text}>
        <Input
          className={styles.control}
          value={values.code}
          placeholder="e.g. LG101"
          onChange={(_, d) => onChange({ code: d.value })}
        />
      </Field>
      <Button className={styles.clear} onClick={onClear}>
        Clear filters
      </Button>
    </div>
  );
}
