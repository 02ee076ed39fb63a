import { Button, CounterBadge, makeStyles, tokens, Tooltip } from '@fluentui/react-components';
import { AlertRegular } from '@fluentui/react-icons';
import { useNavigate } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useUnreadCount } from '../api/get-unread-count';

const useStyles = makeStyles({
  wrap: { position: 'relative', display: 'inline-flex' },
  button: {
    color: tokens.colorNeutralForegroundOnBrand,
    ':hover': { color: tokens.colorNeutralForeground1 },
  },
  badge: { position: 'absolute', top: '-2px', right: '-4px', pointerEvents: 'none' },
});

export interface NotificationBellProps {
  /** Whether someone is signed in (no count is asked for otherwise). */
  readonly signedIn: boolean;
}

/** The header's way to the notifications, with the unread count. */
export function NotificationBell({ signedIn }: NotificationBellProps) {
  const styles = useStyles();
  const navigate = useNavigate();
  const unread = useUnreadCount(signedIn).data?.unread ?? 0;
  const label = unread === 0 ? 'Notifications: none unread' : `Notifications: ${unread} unread`;
  return (
    <Tooltip content={label} relationship="label">
      <span className={styles.wrap}>
        <Button
          appearance="transparent"
          className={styles.button}
          icon={<AlertRegular />}
          onClick={() => navigate(paths.notifications.getHref())}
          data-testid="notification-bell"
        />
        {unread > 0 && (
          <CounterBadge
            className={styles.badge}
            count={unread}
            overflowCount={99}
            size="small"
            color="danger"
            aria-hidden
            data-testid="notification-count"
          />
        )}
      </span>
    </Tooltip>
  );
}
