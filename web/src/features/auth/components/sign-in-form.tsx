import {
  Button,
  Field,
  Input,
  makeStyles,
  MessageBar,
  MessageBarBody,
  tokens,
} from '@fluentui/react-components';
import { useState, type FormEvent } from 'react';
import { z } from 'zod';
import { describeError } from '@/lib/api-error';

const useStyles = makeStyles({
  form: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
});

export const signInSchema = z.object({
  email: z.email('Enter the e-mail address you were invited with.'),
  password: z.string().min(1, 'Enter your password.'),
});
export type SignInInput = z.infer<typeof signInSchema>;

export interface SignInFormProps {
  readonly onSubmit: (input: SignInInput) => void;
  readonly pending: boolean;
  readonly error: unknown;
  /** Lets the demo account list fill the form. */
  readonly initial?: Partial<SignInInput>;
}

/** E-mail and password; field problems are shown under each field, a refused sign-in above the button. */
export function SignInForm({ onSubmit, pending, error, initial }: SignInFormProps) {
  const styles = useStyles();
  const [email, setEmail] = useState(initial?.email ?? '');
  const [password, setPassword] = useState(initial?.password ?? '');
  const [fieldErrors, setFieldErrors] = useState<Partial<Record<keyof SignInInput, string>>>({});

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const parsed = signInSchema.safeParse({ email: email.trim(), password });
    if (!parsed.success) {
      const errs: Partial<Record<keyof SignInInput, string>> = {};
      for (const issue of parsed.error.issues) errs[issue.path[0] as keyof SignInInput] ??= issue.message;
      setFieldErrors(errs);
      return;
    }
    setFieldErrors({});
    onSubmit(parsed.data);
  };

  return (
    <form className={styles.form} onSubmit={submit} noValidate aria-label="Sign in">
      <Field label="E-mail" required validationMessage={fieldErrors.email}>
        <Input type="email" autoComplete="username" value={email} onChange={(_, d) => setEmail(d.value)} />
      </Field>
      <Field label="Password" required validationMessage={fieldErrors.password}>
        <Input
          type="password"
          autoComplete="current-password"
          value={password}
          onChange={(_, d) => setPassword(d.value)}
        />
      </Field>
      {error !== null && error !== undefined && (
        <MessageBar intent="error" role="alert">
          <MessageBarBody>{describeError(error)}</MessageBarBody>
        </MessageBar>
      )}
      <Button appearance="primary" type="submit" disabled={pending}>
        {pending ? 'Signing in…' : 'Sign in'}
      </Button>
    </form>
  );
}
