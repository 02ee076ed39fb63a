import { makeStyles, Text, tokens } from '@fluentui/react-components';
import { MailRegular } from '@fluentui/react-icons';
import { useState } from 'react';
import { PageHeader } from '@/components/page-header';
import { Section } from '@/components/section';
import { EmptyState, ErrorState, LoadingState } from '@/components/states';
import { formatDateTime } from '@/lib/format';
import { useMailbox } from '../api/get-mailbox';

const useStyles = makeStyles({
  layout: {
    display: 'grid',
    gridTemplateColumns: 'minmax(260px, 2fr) minmax(0, 3fr)',
    gap: tokens.spacingHorizontalL,
    '@media (max-width: 900px)': { gridTemplateColumns: 'minmax(0, 1fr)' },
  },
  list: {
    listStyleType: 'none',
    margin: 0,
    padding: 0,
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalXS,
  },
  item: {
    width: '100%',
    textAlign: 'left',
    border: 'none',
    background: 'none',
    padding: tokens.spacingHorizontalS,
    borderRadius: tokens.borderRadiusMedium,
    cursor: 'pointer',
    color: tokens.colorNeutralForeground1,
    fontFamily: tokens.fontFamilyBase,
    ':hover': { backgroundColor: tokens.colorNeutralBackground1Hover },
    ':focus-visible': { outline: `2px solid ${tokens.colorStrokeFocus2}` },
  },
  active: { backgroundColor: tokens.colorBrandBackground2 },
  body: {
    whiteSpace: 'pre-wrap',
    // Links in mail are long unbroken words: let them break rather than push the page sideways.
    overflowWrap: 'anywhere',
    fontFamily: tokens.fontFamilyMonospace,
    fontSize: tokens.fontSizeBase200,
    margin: 0,
  },
  meta: { color: tokens.colorNeutralForeground3 },
});

export function Component() {
  const styles = useStyles();
  const mailbox = useMailbox();
  const [openId, setOpenId] = useState<number | null>(null);
  if (mailbox.isPending) return <LoadingState label="Opening the mailbox…" />;
  if (mailbox.isError) return <ErrorState error={mailbox.error} title="The demo mailbox is not available" />;
  const open = mailbox.data.find((m) => m.id === openId) ?? mailbox.data[0];
  return (
    <>
      <PageHeader
        eyebrow="Demo mode"
        title="Demo mailbox"
        description="Every e-mail the service sent, caught by its local fake mail server. Nothing leaves this machine."
      />
      {mailbox.data.length === 0 ? (
        <EmptyState title="No messages yet" icon={<MailRegular />}>
          Invitations, checked submittals, answers and stamps send mail; it arrives here.
        </EmptyState>
      ) : (
        <div className={styles.layout}>
          <Section title={`${mailbox.data.length} messages`} labelId="messages-heading">
            <ul className={styles.list}>
              {mailbox.data.map((m) => (
                <li key={m.id}>
                  <button
                    type="button"
                    className={`${styles.item} ${open?.id === m.id ? styles.active : ''}`}
                    onClick={() => setOpenId(m.id)}
                    aria-current={open?.id === m.id}
                  >
                    <Text block weight="semibold">
                      {m.subject}
                    </Text>
                    <Text size={200} className={styles.meta}>
                      to {m.to} · {formatDateTime(m.receivedAt)}
                    </Text>
                  </button>
                </li>
              ))}
            </ul>
          </Section>
          {open && (
            <Section title={open.subject} labelId="message-heading">
              <Text block className={styles.meta}>
                From {open.from} to {open.to}, {formatDateTime(open.receivedAt)}
              </Text>
              <pre className={styles.body}>{open.text}</pre>
            </Section>
          )}
        </div>
      )}
    </>
  );
}
