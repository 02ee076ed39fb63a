import type { Role } from '@/lib/session';

export type { Role };

export const ROLE_OPTIONS: readonly { readonly value: Role; readonly label: string }[] = [
  { value: 'checker', label: 'Checker' },
  { value: 'consultant', label: 'Consultant' },
  { value: 'owner-rep', label: "Owner's rep" },
  { value: 'admin', label: 'Admin' },
];
