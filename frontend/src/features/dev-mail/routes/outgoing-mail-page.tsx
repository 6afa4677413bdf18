import { useSuspenseQuery } from '@tanstack/react-query';

import { Icon } from '../../../components/icons/icon';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { PageHeader } from '../../../components/ui/page-header';
import { capturedMailsQueryOptions } from '../api/get-captured-mails';
import { MailItem } from '../components/mail-item';

export function OutgoingMailPage() {
  const { data, refetch, isFetching } = useSuspenseQuery(capturedMailsQueryOptions());

  return (
    <>
      <PageHeader
        title="Outgoing mail"
        description="A development helper: the mails this server sent, caught before they leave, newest first."
        actions={
          data.isCaptureOn ? (
            <Button variant="secondary" onClick={() => void refetch()} isPending={isFetching} pendingLabel="Checking…">
              <Icon name="refresh" />
              Check for new mail
            </Button>
          ) : null
        }
      />
      {!data.isCaptureOn ? (
        <Notice title="Mail capture is off; mails go to the configured SMTP server." />
      ) : data.mails.length === 0 ? (
        <p>No mail has been sent yet. Invite a person or ask for a password reset, then check again.</p>
      ) : (
        <div className="max-w-3xl space-y-4">
          <p role="status" className="text-sm text-graphite-600">
            {data.mails.length} {data.mails.length === 1 ? 'mail' : 'mails'}
          </p>
          {data.mails.map((mail) => (
            <MailItem key={mail.id} mail={mail} />
          ))}
        </div>
      )}
    </>
  );
}
