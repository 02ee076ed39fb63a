import { Navigate } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useSession } from '@/lib/session';

/** The start page for each role: the owner's rep lands on the dashboard, everyone else on projects. */
export function HomeRedirect() {
  const role = useSession()?.user.role;
  return (
    <Navigate to={role === 'owner-rep' ? paths.dashboard.getHref() : paths.projects.getHref()} replace />
  );
}
