export type { Role } from '@/lib/session';
export { ROLE_OPTIONS } from '@/lib/roles';
