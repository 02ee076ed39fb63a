import {
  Button,
  makeStyles,
  MessageBar,
  MessageBarActions,
  MessageBarBody,
  MessageBarTitle,
  Spinner,
  Text,
  tokens,
} from '@fluentui/react-components';
import type { ReactNode } from 'react';
import { describeError } from '@/lib/api-error';

const useStyles = makeStyles({
  centre: {
    display: 'flex',
    flexDirection: 'column',
    alignItems: 'center',
    justifyContent: 'center',
    gap: tokens.spacingVerticalM,
    padding: `${tokens.spacingVerticalXXL} ${tokens.spacingHorizontalL}`,
    textAlign: 'center',
    color: tokens.colorNeutralForeground2,
  },
  emptyIcon: { fontSize: '40px', color: tokens.colorBrandForeground2 },
});

export interface LoadingStateProps {
  readonly label?: string;
}

export function LoadingState({ label = 'Loading…' }: LoadingStateProps) {
  const styles = useStyles();
  return (
    <div className={styles.centre} role="status" aria-live="polite">
      <Spinner label={label} />
    </div>
  );
}

export interface ErrorStateProps {
  readonly error: unknown;
  readonly title?: string;
  readonly onRetry?: () => void;
}

export function ErrorState({ error, title = 'This could not be loaded', onRetry }: ErrorStateProps) {
  return (
    <MessageBar intent="error" role="alert" layout="multiline">
      <MessageBarBody>
        <MessageBarTitle>{title}</MessageBarTitle>
        {describeError(error)}
      </MessageBarBody>
      {onRetry && (
        <MessageBarActions>
          <Button onClick={onRetry}>Try again</Button>
        </MessageBarActions>
      )}
    </MessageBar>
  );
}

export interface EmptyStateProps {
  readonly title: string;
  readonly children?: ReactNode;
  readonly icon?: ReactNode;
  readonly action?: ReactNode;
}

export function EmptyState({ title, children, icon, action }: EmptyStateProps) {
  const styles = useStyles();
  return (
    <div className={styles.centre}>
      {icon && (
        <span className={styles.emptyIcon} aria-hidden>
          {icon}
        </span>
      )}
      <Text weight="semibold" size={400}>
        {title}
      </Text>
      {children && <Text>{children}</Text>}
      {action}
    </div>
  );
}
