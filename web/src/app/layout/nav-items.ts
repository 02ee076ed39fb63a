import type { Role } from '@/lib/session';
import { paths } from '@/config/paths';

export interface NavItem {
  readonly label: string;
  readonly href: string;
  readonly roles: readonly Role[];
  /** Shown only when the server runs in demo mode. */
  readonly demoOnly?: boolean;
}

export const navItems: readonly NavItem[] = [
  { label: 'Dashboard', href: paths.dashboard.getHref(), roles: ['owner-rep', 'admin', 'checker'] },
  {
    label: 'Projects',
    href: paths.projects.getHref(),
    roles: ['admin', 'checker', 'consultant', 'owner-rep'],
  },
  {
    label: 'Discrepancies',
    href: paths.discrepancies.getHref(),
    roles: ['admin', 'checker', 'consultant', 'owner-rep'],
  },
  { label: 'Admin', href: paths.admin.getHref(), roles: ['admin'] },
  { label: 'Account', href: paths.account.getHref(), roles: ['admin', 'checker', 'consultant', 'owner-rep'] },
  {
    label: 'Demo mailbox',
    href: paths.mailbox.getHref(),
    // Invitation links arrive there: admin only.
    roles: ['admin'],
    demoOnly: true,
  },
];

export { roleLabels } from '@/lib/roles';
