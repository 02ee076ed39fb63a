export const ROLE_OPTIONS = [
  { value: 'checker', label: 'Checker' },
  { value: 'consultant', label: 'Consultant' },
  { value: 'owner-rep', label: "Owner's rep" },
  { value: 'admin', label: 'Admin' },
] as const;
