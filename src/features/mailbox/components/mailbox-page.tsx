import { PageHeader } from '../../../components/ui/page-header';
import { EmptyState, ErrorState, LoadingState } from '../../../components/ui/states';
import { errorMessage } from '../../../lib/error-messages';
import { isNoMailbox, useMailbox } from '../../../api/mailbox/get-mailbox';
import { MailboxMessageItem } from './mailbox-message-item';

function MailboxContent({ timeZone }: { timeZone: string }) {
  const mailbox = useMailbox();
  if (mailbox.isPending) return <LoadingState what="the mailbox" />;
  if (mailbox.isError) {
    if (isNoMailbox(mailbox.error)) {
      return <EmptyState title="No development mailbox here">{errorMessage(mailbox.error)}</EmptyState>;
    }
    return <ErrorState error={mailbox.error} what="the mailbox" onRetry={() => mailbox.refetch()} />;
  }
  if (mailbox.data.items.length === 0) {
    return (
      <EmptyState title="The mailbox is empty">
        While the app runs without a real mail server, every e-mail it sends arrives here instead, and nothing leaves this machine. Book
        a spray session for a sprayer, or mark parts ready, and the message shows up within a minute or so.
      </EmptyState>
    );
  }
  const sorted = [...mailbox.data.items].sort((a, b) => b.receivedAt.localeCompare(a.receivedAt) || b.id - a.id);
  return (
    <>
      <p className="mb-2 text-sm text-maple-700">
        {mailbox.data.total === 1 ? '1 message' : `${mailbox.data.total} messages`}, newest first. Open one to read it.
      </p>
      <ul aria-label="Caught e-mails" className="divide-y divide-maple-200 rounded-panel border border-maple-300 bg-white">
        {sorted.map((message) => (
          <MailboxMessageItem key={message.id} message={message} timeZone={timeZone} />
        ))}
      </ul>
    </>
  );
}

/** The development mailbox: e-mail the app sent while no real SMTP server is set, kept in memory. */
export function MailboxPage({ timeZone }: { timeZone: string }) {
  return (
    <>
      <PageHeader
        title="Mailbox"
        description="E-mails the app has sent since it started, caught here instead of going out. Checks for new ones every 10 seconds."
      />
      <MailboxContent timeZone={timeZone} />
    </>
  );
}
