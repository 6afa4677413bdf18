import type { OutboxItem } from '../outbox/outbox-types';
import type { SendResult } from '../outbox/outbox-engine';
import { benchFetch } from './bench-fetch';

const NESTED_RECORDS = ['reading', 'timer', 'deviation', 'file', 'record', 'stepRecord'] as const;

/**
 * The id of what a write created or changed. Writes answer with the record itself; an
 * out-of-limit reading may answer with the reading and the deviation it raised.
 */
export function resultIdOf(body: unknown): number | null {
  if (typeof body !== 'object' || body === null) return null;
  const record = body as Record<string, unknown>;
  if (typeof record.id === 'number') return record.id;
  for (const key of NESTED_RECORDS) {
    const nested = record[key];
    if (typeof nested === 'object' && nested !== null && typeof (nested as { id?: unknown }).id === 'number') return (nested as { id: number }).id;
  }
  return null;
}

/** Sends one outbox item: a photo as multipart `file`, everything else as JSON. */
export async function sendWrite(item: OutboxItem): Promise<SendResult> {
  let form: FormData | undefined;
  if (item.kind === 'upload-photo' && item.photo) {
    form = new FormData();
    const type = item.photo.type || 'image/jpeg';
    const name = `run-${item.runId}-${item.id}.${type.split('/')[1] ?? 'jpg'}`;
    form.append('file', new File([item.photo], name, { type }));
  }
  const { body } = await benchFetch({
    method: 'POST',
    path: item.path,
    json: form ? undefined : (item.body ?? {}),
    form,
    idempotencyKey: item.idempotencyKey,
  });
  return { resultId: resultIdOf(body) };
}
