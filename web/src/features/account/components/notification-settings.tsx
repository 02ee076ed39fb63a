import {
  makeStyles,
  Switch,
  Table,
  TableBody,
  TableCell,
  TableHeader,
  TableHeaderCell,
  TableRow,
  Text,
  tokens,
} from '@fluentui/react-components';
import { ErrorState, LoadingState } from '@/components/states';
import { useNotificationSettings } from '../api/get-notification-settings';
import { useUpdateNotificationSettings } from '../api/update-notification-settings';

const useStyles = makeStyles({
  wrap: { overflowX: 'auto' },
  description: { display: 'block', color: tokens.colorNeutralForeground3, fontSize: tokens.fontSizeBase200 },
});

/** Per kind, whether the user is told in the app and by mail; each switch saves at once. */
export function NotificationSettings() {
  const styles = useStyles();
  const settings = useNotificationSettings();
  const update = useUpdateNotificationSettings();
  if (settings.isPending) return <LoadingState label="Loading your choices…" />;
  if (settings.isError) return <ErrorState error={settings.error} onRetry={() => void settings.refetch()} />;
  if (settings.data.length === 0)
    return <Text>Your role is not told about discrepancies; nothing to choose here.</Text>;
  const save = (kind: string, change: { inApp?: boolean; mail?: boolean }) => {
    const current = settings.data.find((s) => s.kind === kind);
    if (!current) return;
    update.mutate([
      { kind: current.kind, inApp: change.inApp ?? current.inApp, mail: change.mail ?? current.mail },
    ]);
  };
  return (
    <div className={styles.wrap}>
      <Table aria-label="What you are told about">
        <TableHeader>
          <TableRow>
            <TableHeaderCell>When</TableHeaderCell>
            <TableHeaderCell>In the app</TableHeaderCell>
            <TableHeaderCell>By mail</TableHeaderCell>
          </TableRow>
        </TableHeader>
        <TableBody>
          {settings.data.map((s) => (
            <TableRow key={s.kind}>
              <TableCell>
                {s.label}
                <span className={styles.description}>{s.description}</span>
              </TableCell>
              <TableCell>
                <Switch
                  checked={s.inApp}
                  disabled={update.isPending}
                  aria-label={`${s.label}: in the app`}
                  onChange={(_, d) => save(s.kind, { inApp: d.checked })}
                />
              </TableCell>
              <TableCell>
                <Switch
                  checked={s.mail}
                  disabled={update.isPending}
                  aria-label={`${s.label}: by mail`}
                  onChange={(_, d) => save(s.kind, { mail: d.checked })}
                />
              </TableCell>
            </TableRow>
          ))}
        </TableBody>
      </Table>
    </div>
  );
}
