import { Field, Input } from '@fluentui/react-components';
import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { z } from 'zod';
import { renderWithProviders } from '@/testing/render';
import { AdminForm, issuesByField, OrganisationField, RoleDropdown } from './admin-form';

const FIRMS = [
  { id: 1, name: 'Fennick & Ode Structural' },
  { id: 2, name: 'Larchmont Peer Review' },
];

describe('AdminForm', () => {
  it('submits on the button and on Enter in a text field, and is named for assistive technology', async () => {
    const onSubmit = vi.fn();
    renderWithProviders(
      <AdminForm label="New project" submitLabel="Create project" pending={false} onSubmit={onSubmit}>
        <Field label="Name">
          <Input />
        </Field>
      </AdminForm>,
    );
    expect(screen.getByRole('form', { name: 'New project' })).toBeInTheDocument();
    await userEvent.click(screen.getByRole('button', { name: 'Create project' }));
    await userEvent.type(screen.getByLabelText('Name'), 'Harbour Lantern{Enter}');
    expect(onSubmit).toHaveBeenCalledTimes(2);
  });

  it('does not submit again while the last one is pending', async () => {
    const onSubmit = vi.fn();
    renderWithProviders(
      <AdminForm label="New project" submitLabel="Create project" pending onSubmit={onSubmit}>
        <Field label="Name">
          <Input />
        </Field>
      </AdminForm>,
    );
    expect(screen.getByRole('button', { name: 'Create project' })).toBeDisabled();
    await userEvent.type(screen.getByLabelText('Name'), 'x{Enter}');
    expect(onSubmit).not.toHaveBeenCalled();
  });
});

describe('issuesByField', () => {
  it('keeps the first message zod gives for each field', () => {
    const schema = z.object({
      name: z.string().min(1, 'Name it.').max(3, 'Too long.'),
      email: z.email('Enter an e-mail address.'),
      age: z.number().optional(),
    });
    const parsed = schema.safeParse({ name: '', email: 'nope' });
    expect(parsed.success).toBe(false);
    if (parsed.success) return;
    expect(issuesByField(parsed.error)).toEqual({ name: 'Name it.', email: 'Enter an e-mail address.' });
  });
});

describe('OrganisationField', () => {
  it('is labelled, shows "None" until a firm is chosen, and reports the chosen id', async () => {
    const onChange = vi.fn();
    renderWithProviders(
      <OrganisationField label="Firm" organisations={FIRMS} value={undefined} onChange={onChange} />,
    );
    const picker = screen.getByRole('combobox', { name: 'Firm' });
    expect(picker).toHaveTextContent('None');
    await userEvent.click(picker);
    await userEvent.click(screen.getByRole('option', { name: 'Larchmont Peer Review' }));
    expect(onChange).toHaveBeenCalledWith(2);
  });

  it('shows the chosen firm by name', () => {
    renderWithProviders(
      <OrganisationField label="Owner" organisations={FIRMS} value={1} onChange={vi.fn()} />,
    );
    expect(screen.getByRole('combobox', { name: 'Owner' })).toHaveTextContent('Fennick & Ode Structural');
  });
});

describe('RoleDropdown', () => {
  it('reports a new role chosen from the keyboard, and nothing when the current one is chosen again', async () => {
    const onChange = vi.fn();
    renderWithProviders(<RoleDropdown aria-label="Role of Priya" value="consultant" onChange={onChange} />);
    const picker = screen.getByRole('combobox', { name: 'Role of Priya' });
    expect(picker).toHaveTextContent('Consultant');
    await userEvent.click(picker);
    await userEvent.click(screen.getByRole('option', { name: 'Consultant' }));
    expect(onChange).not.toHaveBeenCalled();
    picker.focus();
    await userEvent.keyboard('{ArrowDown}');
    await userEvent.keyboard('{End}{Enter}');
    expect(onChange).toHaveBeenCalledWith('admin');
  });
});
