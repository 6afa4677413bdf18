import { queryOptions } from '@tanstack/react-query';

import { CapturedMailListSchema, type CapturedMail } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';
import { isApiError } from '../../../lib/api-error';
import { mailKeys } from './mail-keys';

/** 404 means capture is switched off on the server (mail goes to real SMTP): a state, not a fault. */
export type MailCapture = { isCaptureOn: true; mails: CapturedMail[] } | { isCaptureOn: false; mails: [] };

export async function getCapturedMails(signal?: AbortSignal): Promise<MailCapture> {
  try {
    const { mails } = CapturedMailListSchema.parse(await apiClient.get('/api/dev/mails', { signal }));
    // Newest first regardless of the order the server keeps them in.
    const sorted = [...mails].sort((a, b) => Date.parse(b.receivedAt) - Date.parse(a.receivedAt));
    return { isCaptureOn: true, mails: sorted };
  } catch (error) {
    if (isApiError(error, 404)) return { isCaptureOn: false, mails: [] };
    throw error;
  }
}

export const capturedMailsQueryOptions = () =>
  queryOptions({ queryKey: mailKeys.list(), queryFn: ({ signal }) => getCapturedMails(signal), staleTime: 0 });
