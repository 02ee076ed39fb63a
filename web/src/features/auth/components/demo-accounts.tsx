import { Button, Card, makeStyles, Text, tokens } from '@fluentui/react-components';
import { useServerInfo } from '@/lib/server-info';
import type { SignInInput } from './sign-in-form';

const useStyles = makeStyles({
  card: {
    width: '100%',
    maxWidth: '420px',
    padding: tokens.spacingHorizontalL,
    gap: tokens.spacingVerticalS,
  },
  list: {
    listStyleType: 'none',
    margin: 0,
    padding: 0,
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalXS,
  },
  row: {
    display: 'flex',
    justifyContent: 'space-between',
    alignItems: 'center',
    gap: tokens.spacingHorizontalS,
  },
});

/** The demo's fictional people, as the service seeds them (its README lists the same sign-ins). */
const DEMO_PASSWORD = 'lantern-demo-2026';
const DEMO_ACCOUNTS = [
  {
    name: 'Tomasz Quell',
    role: 'Checker · Larchmont Peer Review',
    email: 'tomasz@larchmont-review.example.test',
  },
  {
    name: 'Priya Halvorsen',
    role: 'Consultant · Fennick & Ode Structural',
    email: 'priya@fennick-ode.example.test',
  },
  {
    name: 'Adaeze Marlow',
    role: 'Owner’s representative · Tidewater Crossing Authority',
    email: 'adaeze@tidewater-crossing.example.test',
  },
  { name: 'Sam Oduya', role: 'Admin', email: 'sam@tidewater-crossing.example.test' },
] as const;

export interface DemoAccountsProps {
  readonly onPick: (input: SignInInput) => void;
  readonly disabled: boolean;
}

/** One-click sign-in for the demo's people; shown only when the server runs in demo mode. */
export function DemoAccounts({ onPick, disabled }: DemoAccountsProps) {
  const styles = useStyles();
  const info = useServerInfo();
  if (!info.data?.demo) return null;
  return (
    <Card className={styles.card} appearance="subtle">
      <Text weight="semibold">Demo mode — sign in as one of the fictional team</Text>
      <ul className={styles.list}>
        {DEMO_ACCOUNTS.map((a) => (
          <li key={a.email} className={styles.row}>
            <span>
              <Text block>{a.name}</Text>
              <Text size={200}>{a.role}</Text>
            </span>
            <Button
              size="small"
              disabled={disabled}
              onClick={() => onPick({ email: a.email, password: DEMO_PASSWORD })}
              aria-label={`Sign in as ${a.name}`}
            >
              Sign in
            </Button>
          </li>
        ))}
      </ul>
    </Card>
  );
}
