import { data } from 'react-router';

/** The `:runId` of the address as a number; anything else is a page that does not exist. */
export function runIdParam(params: { runId?: string }): number {
  const id = Number(params.runId);
  if (!Number.isInteger(id) || id < 1) throw data(null, { status: 404, statusText: 'Not Found' });
  return id;
}
