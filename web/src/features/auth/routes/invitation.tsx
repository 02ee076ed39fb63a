import {
  Button,
  Card,
  Field,
  Input,
  makeStyles,
  MessageBar,
  MessageBarBody,
  Text,
  Title2,
  tokens,
} from '@fluentui/react-components';
import { useState } from 'react';
import { Link, useNavigate, useParams } from 'react-router-dom';
import { LogoMark } from '@/components/logo-mark';
import { ErrorState, LoadingState } from '@/components/states';
import { CAUTION } from 'ligament/engine';
import { paths } from '@/config/paths';
import { ApiError, describeError } from '@/lib/api-error';
import { roleLabel } from '@/lib/roles';
import { acceptInvitationInputSchema, useAcceptInvitation } from '../api/accept-invitation';
import { useInvitation } from '../api/get-invitation';

const useStyles = makeStyles({
  page: {
    minHeight: '100vh',
    display: 'flex',
    flexDirection: 'column',
    alignItems: 'center',
    justifyContent: 'center',
    gap: tokens.spacingVerticalL,
    padding: tokens.spacingHorizontalL,
    backgroundColor: tokens.colorNeutralBackground2,
  },
  card: {
    width: '100%',
    maxWidth: '440px',
    padding: tokens.spacingHorizontalXXL,
    gap: tokens.spacingVerticalM,
  },
  brand: { display: 'flex', alignItems: 'center', gap: tokens.spacingHorizontalS },
});

/**
 * A link that can no longer be used (already used, withdrawn, sent again, expired or unknown): what
 * happened, in words, and the way on, which is signing in (or asking the admin for a new link).
 */
function DeadLink({ error }: { error: unknown }) {
  const navigate = useNavigate();
  const gone = error instanceof ApiError && (error.statusCode === 410 || error.statusCode === 404);
  if (!gone) return <ErrorState error={error} title="The invitation could not be read" />;
  return (
    <>
      <Title2 as="h1">This invitation link cannot be used</Title2>
      <Text>{error.message}</Text>
      <Text>
        If you already have an account, sign in. Otherwise ask your Ligament admin for a new invitation.
      </Text>
      <Button appearance="primary" onClick={() => navigate(paths.signIn.getHref(), { replace: true })}>
        Go to sign in
      </Button>
    </>
  );
}

export function Component() {
  const styles = useStyles();
  const token = useParams().token ?? '';
  const invitation = useInvitation(token);
  const accept = useAcceptInvitation(token);
  const [password, setPassword] = useState('');
  const [confirm, setConfirm] = useState('');
  const [errors, setErrors] = useState<Record<string, string>>({});

  const submit = () => {
    const parsed = acceptInvitationInputSchema.safeParse({ password, confirm });
    if (!parsed.success) {
      const next: Record<string, string> = {};
      for (const issue of parsed.error.issues) next[String(issue.path[0])] ??= issue.message;
      setErrors(next);
      return;
    }
    setErrors({});
    accept.mutate(parsed.data);
  };

  return (
    <main className={styles.page}>
      <div className={styles.brand}>
        <LogoMark size={36} />
        <Text size={600} weight="semibold">
          Ligament
        </Text>
      </div>
      <Card className={styles.card}>
        {invitation.isPending ? (
          <LoadingState label="Reading the invitation…" />
        ) : invitation.isError ? (
          <DeadLink error={invitation.error} />
        ) : accept.isSuccess ? (
          <>
            <Title2 as="h1">You are in</Title2>
            <Text>Your account {accept.data.email} is active.</Text>
            <Link to={paths.signIn.getHref()}>Sign in</Link>
          </>
        ) : (
          <>
            <Title2 as="h1">Welcome, {invitation.data.name}</Title2>
            <Text>
              You are invited as {roleLabel(invitation.data.role).toLowerCase()}
              {invitation.data.organisation ? ` for ${invitation.data.organisation}` : ''} (
              {invitation.data.email}). Choose a password to activate the account.
            </Text>
            <Field
              label="Password"
              required
              validationMessage={errors.password}
              hint="At least 10 characters."
            >
              <Input
                type="password"
                autoComplete="new-password"
                value={password}
                onChange={(_, d) => setPassword(d.value)}
              />
            </Field>
            <Field label="Password again" required validationMessage={errors.confirm}>
              <Input
                type="password"
                autoComplete="new-password"
                value={confirm}
                onChange={(_, d) => setConfirm(d.value)}
              />
            </Field>
            {accept.isError && (
              <MessageBar intent="error" role="alert">
                <MessageBarBody>{describeError(accept.error)}</MessageBarBody>
              </MessageBar>
            )}
            <Button appearance="primary" onClick={submit} disabled={accept.isPending}>
              Activate my account
            </Button>
          </>
        )}
      </Card>
      <Text size={200}>{CAUTION}</Text>
    </main>
  );
}
