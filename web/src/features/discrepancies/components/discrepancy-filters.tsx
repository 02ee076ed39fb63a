import {
  Button,
  Dropdown,
  Field,
  Input,
  makeStyles,
  Option,
  Switch,
  tokens,
} from '@fluentui/react-components';
import { SearchRegular } from '@fluentui/react-icons';
import { SEVERITIES } from 'ligament/engine';
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
  // A long submittal title stays on one line in the closed dropdown (the list shows it whole).
  oneLine: { whiteSpace: 'nowrap', overflow: 'hidden', textOverflow: 'ellipsis' },
  search: { flexGrow: 3, flexShrink: 1, flexBasis: '260px', minWidth: 0 },
  clear: { flexGrow: 0, flexShrink: 0 },
  switch: { flexGrow: 0, flexShrink: 0 },
});

export interface FilterValues {
  readonly q: string;
  readonly submittalId: number | undefined;
  readonly includeSuperseded: boolean;
  readonly status: readonly string[];
  readonly class: readonly string[];
  readonly severity: readonly string[];
  readonly memberId: string;
  readonly code: string;
}

export interface DiscrepancyFiltersProps {
  readonly values: FilterValues;
  /** The project's submittals, newest first, for the submittal filter. */
  readonly submittals: readonly { readonly id: number; readonly title: string }[];
  readonly onChange: (next: Partial<FilterValues>) => void;
  readonly onClear: () => void;
}

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

const ALL_SUBMITTALS = 'all';

/**
 * Filters the server applies: free text, submittal, status (with "open" for raised, answered and
 * returned), class, severity, member and code; and whether items a later revision took over show.
 */
export function DiscrepancyFilters({ values, submittals, onChange, onClear }: DiscrepancyFiltersProps) {
  const styles = useStyles();
  const submittal = submittals.find((s) => s.id === values.submittalId);
  return (
    <div className={styles.bar} role="search" aria-label="Filter discrepancies">
      <Field label="Search" className={styles.search}>
        <Input
          className={styles.control}
          type="search"
          contentBefore={<SearchRegular />}
          value={values.q}
          placeholder="Finding, member, file, code or #id"
          onChange={(_, d) => onChange({ q: d.value })}
        />
      </Field>
      <Field label="Submittal" className={styles.choice}>
        <Dropdown
          className={styles.control}
          button={{
            className: styles.oneLine,
            title: submittal ? `#${submittal.id} ${submittal.title}` : undefined,
          }}
          value={
            submittal
              ? `#${submittal.id} ${submittal.title}`
              : values.submittalId
                ? `#${values.submittalId}`
                : 'All submittals'
          }
          selectedOptions={[values.submittalId ? String(values.submittalId) : ALL_SUBMITTALS]}
          onOptionSelect={(_, d) =>
            onChange({ submittalId: d.optionValue === ALL_SUBMITTALS ? undefined : Number(d.optionValue) })
          }
        >
          <Option value={ALL_SUBMITTALS}>All submittals</Option>
          {submittals.map((s) => (
            <Option key={s.id} value={String(s.id)} text={`#${s.id} ${s.title}`}>
              {`#${s.id} ${s.title}`}
            </Option>
          ))}
        </Dropdown>
      </Field>
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
      <Switch
        className={styles.switch}
        label="Show superseded items"
        checked={values.includeSuperseded}
        onChange={(_, d) => onChange({ includeSuperseded: d.checked })}
      />
      <Button className={styles.clear} onClick={onClear}>
        Clear filters
      </Button>
    </div>
  );
}
