import { Link } from 'react-router-dom';
import { EmptyState } from '@/components/states';
import { paths } from '@/config/paths';

export function NotFound() {
  return (
    <EmptyState
      title="There is no page here"
      action={<Link to={paths.home.getHref()}>Go to the start page</Link>}
    >
      The address may be mistyped, or the page may have moved.
    </EmptyState>
  );
}
