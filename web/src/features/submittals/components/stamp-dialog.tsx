import {
  Button,
  Dialog,
  DialogActions,
  DialogBody,
  DialogContent,
  DialogSurface,
  DialogTitle,
  DialogTrigger,
  Field,
  makeStyles,
  MessageBar,
  MessageBarBody,
  Radio,
  RadioGroup,
  Textarea,
  tokens,
} from '@fluentui/react-components';
import { ApprovalsAppRegular } from '@fluentui/react-icons';
import { useState } from 'react';
import { describeError } from '@/lib/api-error';
import {
  STAMP_ACTIONS,
  stampActionLabels,
  stampInputSchema,
  useStampSubmittal,
  type StampInput,
} from '../api/stamp-submittal';

const useStyles = makeStyles({
  content: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
});

export interface StampDialogProps {
  readonly submittalId: number;
  readonly projectId: number;
  /** Open error-severity discrepancies: stamping then needs a stated reason. */
  readonly openErrors: number;
}

/** The checker's stamp: a review action, a comment, and a reason when serious discrepancies are still open. */
export function StampDialog({ submittalId, projectId, openErrors }: StampDialogProps) {
  const styles = useStyles();
  const [open, setOpen] = useState(false);
  const [action, setAction] = useState<StampInput['action']>(
    openErrors > 0 ? 'revise-and-resubmit' : 'no-exceptions-taken',
  );
  const [comment, setComment] = useState('');
  const [overrideReason, setOverrideReason] = useState('');
  const [errors, setErrors] = useState<Record<string, string>>({});
  const stamp = useStampSubmittal(submittalId, projectId);

  const submit = () => {
    const parsed = stampInputSchema.safeParse({
      action,
      comment,
      overrideReason: overrideReason || undefined,
    });
    const next: Record<string, string> = {};
    if (!parsed.success)
      for (const issue of parsed.error.issues) next[String(issue.path[0])] ??= issue.message;
    if (openErrors > 0 && !overrideReason.trim())
      next.overrideReason = 'Say why the stamp goes out while error-severity discrepancies are open.';
    setErrors(next);
    if (!parsed.success || Object.keys(next).length > 0) return;
    stamp.mutate(parsed.data, { onSuccess: () => setOpen(false) });
  };

  return (
    <Dialog open={open} onOpenChange={(_, d) => setOpen(d.open)}>
      <DialogTrigger disableButtonEnhancement>
        <Button appearance="primary" icon={<ApprovalsAppRegular />}>
          Stamp…
        </Button>
      </DialogTrigger>
      <DialogSurface>
        <DialogBody>
          <DialogTitle>Stamp submittal #{submittalId}</DialogTitle>
          <DialogContent className={styles.content}>
            <Field label="Review action" required>
              <RadioGroup value={action} onChange={(_, d) => setAction(d.value as StampInput['action'])}>
                {STAMP_ACTIONS.map((a) => (
                  <Radio key={a} value={a} label={stampActionLabels[a]} />
                ))}
              </RadioGroup>
            </Field>
            <Field label="Comment to the consultant" required validationMessage={errors.comment}>
              <Textarea value={comment} onChange={(_, d) => setComment(d.value)} resize="vertical" rows={3} />
            </Field>
            {openErrors > 0 && (
              <>
                <MessageBar intent="warning">
                  <MessageBarBody>
                    {openErrors} error-severity discrepanc{openErrors === 1 ? 'y is' : 'ies are'} still open.
                    The stamp records your reason for going ahead.
                  </MessageBarBody>
                </MessageBar>
                <Field
                  label="Reason for stamping with open errors"
                  required
                  validationMessage={errors.overrideReason}
                >
                  <Textarea
                    value={overrideReason}
                    onChange={(_, d) => setOverrideReason(d.value)}
                    resize="vertical"
                    rows={2}
                  />
                </Field>
              </>
            )}
            {stamp.isError && (
              <MessageBar intent="error" role="alert">
                <MessageBarBody>{describeError(stamp.error)}</MessageBarBody>
              </MessageBar>
            )}
          </DialogContent>
          <DialogActions>
            <DialogTrigger disableButtonEnhancement>
              <Button appearance="secondary">Cancel</Button>
            </DialogTrigger>
            <Button appearance="primary" onClick={submit} disabled={stamp.isPending}>
              {stamp.isPending ? 'Stamping…' : 'Stamp'}
            </Button>
          </DialogActions>
        </DialogBody>
      </DialogSurface>
    </Dialog>
  );
}
