import { Card, makeStyles, Text, Title1, tokens } from '@fluentui/react-components';
import { useMutation } from '@tanstack/react-query';
import { Navigate, useNavigate, useSearchParams } from 'react-router-dom';
import { LogoMark } from '@/components/logo-mark';
import { CAUTION } from 'ligament/engine';
import { paths } from '@/config/paths';
import { signIn } from '@/lib/auth';
import { useSession, useSessionStatus } from '@/lib/session';
import { LoadingState } from '@/components/states';
import { DemoAccounts } from '../components/demo-accounts';
import { SignInForm, type SignInInput } from '../components/sign-in-form';

const useStyles = makeStyles({
  page: {
    minHeight: '100vh',
    display: 'grid',
    gridTemplateColumns: 'minmax(280px, 5fr) 7fr',
    '@media (max-width: 900px)': { gridTemplateColumns: '1fr' },
  },
  aside: {
    backgroundColor: tokens.colorBrandBackgroundStatic,
    color: tokens.colorNeutralForegroundOnBrand,
    padding: tokens.spacingHorizontalXXXL,
    display: 'flex',
    flexDirection: 'column',
    justifyContent: 'space-between',
    gap: tokens.spacingVerticalXXL,
  },
  brand: { display: 'flex', alignItems: 'center', gap: tokens.spacingHorizontalM },
  wordmark: { fontSize: tokens.fontSizeHero700, fontWeight: tokens.fontWeightSemibold },
  pitch: { maxWidth: '34ch', fontSize: tokens.fontSizeBase500, lineHeight: tokens.lineHeightBase500 },
  caution: { opacity: 0.85, maxWidth: '46ch' },
  content: {
    display: 'flex',
    flexDirection: 'column',
    alignItems: 'center',
    justifyContent: 'center',
    gap: tokens.spacingVerticalXL,
    padding: tokens.spacingHorizontalXXL,
    backgroundColor: tokens.colorNeutralBackground2,
  },
  card: { width: '100%', maxWidth: '420px', padding: tokens.spacingHorizontalXXL },
});

export function Component() {
  const styles = useStyles();
  const session = useSession();
  const status = useSessionStatus();
  const navigate = useNavigate();
  const [params] = useSearchParams();
  const redirectTo = params.get('redirectTo');
  const target =
    redirectTo && redirectTo.startsWith('/') && !redirectTo.startsWith('//')
      ? redirectTo
      : paths.home.getHref();
  const mutation = useMutation({
    mutationFn: ({ email, password }: SignInInput) => signIn(email, password),
    onSuccess: () => navigate(target, { replace: true }),
  });

  if (session && !mutation.isPending) return <Navigate to={target} replace />;
  if (status === 'restoring') return <LoadingState label="Signing you in again…" />;

  return (
    <div className={styles.page}>
      <aside className={styles.aside}>
        <div className={styles.brand}>
          <LogoMark size={48} onBrand />
          <span className={styles.wordmark}>Ligament</span>
        </div>
        <Text className={styles.pitch}>
          Every chain of holes, every load direction: the net section of bolted plates, recomputed and
          compared with what was claimed.
        </Text>
        <Text size={200} className={styles.caution}>
          {CAUTION}
        </Text>
      </aside>
      <main className={styles.content}>
        <Card className={styles.card}>
          <Title1 as="h1">Sign in</Title1>
          {redirectTo && (
            <Text>
              Sign in to continue to the page you asked for; if your session ended, you will be taken back
              there.
            </Text>
          )}
          <SignInForm
            onSubmit={(input) => mutation.mutate(input)}
            pending={mutation.isPending}
            error={mutation.error}
          />
        </Card>
        <DemoAccounts onPick={(input) => mutation.mutate(input)} disabled={mutation.isPending} />
      </main>
    </div>
  );
}
