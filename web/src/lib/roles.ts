import type { Role } from './session';

/** Each role in words: the only way a role is ever shown (the API's values are for machines). */
export const roleLabels: Readonly<Record<Role, string>> = {
  admin: 'Admin',
  checker: 'Checker',
  consultant: 'Consultant',
  'owner-rep': 'Owner’s representative',
};

/** The role in words; a value the app does not know is shown as it is rather than hidden. */
export function roleLabel(role: string): string {
  return (roleLabels as Record<string, string>)[role] ?? role;
}

/** The roles in the order the admin's pickers list them. */
export const ROLE_OPTIONS: readonly { readonly value: Role; readonly label: string }[] = (
  ['checker', 'consultant', 'owner-rep', 'admin'] as const
).map((value) => ({ value, label: roleLabels[value] }));
