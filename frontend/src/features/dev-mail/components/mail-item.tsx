import { useId } from 'react';

import type { CapturedMail } from '@tracewright/shared';

import { formatDateTime } from '../../../lib/format-date';
import { LinkedText } from './linked-text';

export function MailItem({ mail }: { mail: CapturedMail }) {
  const titleId = useId();
  return (
    <article aria-labelledby={titleId} className="rounded-md border border-graphite-300 bg-white p-4">
      <h2 id={titleId} className="text-lg font-bold">
        {mail.subject || '(no subject)'}
      </h2>
      <dl className="mt-1 grid grid-cols-[auto_1fr] gap-x-3 text-sm text-graphite-700">
        <dt className="font-bold">To</dt>
        <dd className="break-all">{mail.to.join(', ')}</dd>
        <dt className="font-bold">From</dt>
        <dd className="break-all">{mail.from}</dd>
        <dt className="font-bold">Sent</dt>
        <dd className="tabular">
          <time dateTime={mail.receivedAt}>{formatDateTime(mail.receivedAt, true)}</time>
        </dd>
      </dl>
      <div className="mt-3 border-t border-graphite-200 pt-3">
        <LinkedText text={mail.text} />
      </div>
    </article>
  );
}
