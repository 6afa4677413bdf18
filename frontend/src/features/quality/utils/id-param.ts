import { data } from 'react-router';

/** A numeric id of the address (`:deviationId`); anything else is a page that does not exist. */
export function idParam(value: string | undefined): number {
  const id = Number(value);
  if (!Number.isInteger(id) || id < 1) throw data(null, { status: 404, statusText: 'Not Found' });
  return id;
}
