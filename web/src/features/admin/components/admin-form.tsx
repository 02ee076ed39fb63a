import { Button, Dropdown, Field, makeStyles, Option, tokens } from '@fluentui/react-components';
import type { ReactNode } from 'react';
import type { z } from 'zod';
import { ROLE_OPTIONS, type Role } from './roles';

const useStyles = makeStyles({
  form: {
    display: 'grid',
    gridTemplateColumns: 'repeat(auto-fit, minmax(180px, 1fr))',
    gap: tokens.spacingHorizontalM,
    alignItems: 'end',
    marginBottom: tokens.spacingVerticalL,
    // Fluent's Dropdown keeps a 250 px minimum, wider than a 180 px column: without this it ran
    // into the next field (Role over Firm at 1280 px).
    '& .fui-Dropdown': { minWidth: 0 },
  },
});

/** The first message zod gives for each top-level field, keyed by the field's name. */
export function issuesByField(error: z.ZodError): Record<string, string> {
  const byField: Record<string, string> = {};
  for (const issue of error.issues) byField[String(issue.path[0])] ??= issue.message;
  return byField;
}

export interface AdminFormProps {
  /** The form's accessible name. */
  readonly label: string;
  readonly submitLabel: string;
  readonly pending: boolean;
  readonly onSubmit: () => void;
  readonly children: ReactNode;
}

/**
 * The create form above an admin table: fields in a row that wraps, then the primary button.
 * A real form, so Enter in a text field submits it; the panel validates (zod), not the browser.
 */
export function AdminForm({ label, submitLabel, pending, onSubmit, children }: AdminFormProps) {
  const styles = useStyles();
  return (
    <form
      className={styles.form}
      aria-label={label}
      noValidate
      onSubmit={(event) => {
        event.preventDefault();
        if (!pending) onSubmit();
      }}
    >
      {children}
      <Button type="submit" appearance="primary" disabled={pending}>
        {submitLabel}
      </Button>
    </form>
  );
}

export interface OrganisationFieldProps {
  readonly label: string;
  readonly organisations: readonly { readonly id: number; readonly name: string }[] | undefined;
  readonly value: number | undefined;
  readonly onChange: (organisationId: number | undefined) => void;
}

/** A firm picker (optional: "None" until one is chosen). */
export function OrganisationField({ label, organisations, value, onChange }: OrganisationFieldProps) {
  return (
    <Field label={label}>
      <Dropdown
        placeholder="None"
        value={organisations?.find((o) => o.id === value)?.name ?? ''}
        selectedOptions={value ? [String(value)] : []}
        onOptionSelect={(_, d) => onChange(d.optionValue ? Number(d.optionValue) : undefined)}
      >
        {(organisations ?? []).map((o) => (
          <Option key={o.id} value={String(o.id)}>
            {o.name}
          </Option>
        ))}
      </Dropdown>
    </Field>
  );
}

export interface RoleDropdownProps {
  readonly value: Role;
  readonly onChange: (role: Role) => void;
  /** Needed where no Field labels it (a table cell). */
  readonly 'aria-label'?: string;
}

/** The four roles; choosing the current one again changes nothing. */
export function RoleDropdown({ value, onChange, 'aria-label': ariaLabel }: RoleDropdownProps) {
  return (
    <Dropdown
      aria-label={ariaLabel}
      value={ROLE_OPTIONS.find((r) => r.value === value)?.label ?? value}
      selectedOptions={[value]}
      onOptionSelect={(_, d) => {
        const next = ROLE_OPTIONS.find((r) => r.value === d.optionValue)?.value;
        if (next && next !== value) onChange(next);
      }}
    >
      {ROLE_OPTIONS.map((r) => (
        <Option key={r.value} value={r.value}>
          {r.label}
        </Option>
      ))}
    </Dropdown>
  );
}
