import type { ReactNode } from 'react';
import { Navigate, useLocation } from 'react-router-dom';
import { EmptyState, LoadingState } from '@/components/states';
import { paths } from '@/config/paths';
import { useSession, useSessionStatus, type Role } from '@/lib/session';
import { roleLabels } from './layout/nav-items';

export interface RequireRoleProps {
  /** Roles allowed in; omit to allow any signed-in user. */
  readonly roles?: readonly Role[];
  readonly children: ReactNode;
}

/** Sends a signed-out visitor to sign in (and back afterwards); tells a signed-in one when a page is not for their role. */
export function RequireRole({ roles, children }: RequireRoleProps) {
  const session = useSession();
  const status = useSessionStatus();
  const location = useLocation();
  if (status === 'restoring') return <LoadingState label="Signing you in again…" />;
  if (!session) {
    return <Navigate to={paths.signIn.getHref(`${location.pathname}${location.search}`)} replace />;
  }
  if (roles && !roles.includes(session.user.role)) {
    return (
      <EmptyState title="This page is not part of your role">
        You are signed in as {roleLabels[session.user.role]}. It is open to{' '}
        {roles.map((r) => roleLabels[r]).join(', ')}.
      </EmptyState>
    );
  }
  return <>{children}</>;
}
