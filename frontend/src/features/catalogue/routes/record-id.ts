import { data, type Params } from 'react-router';

/** The record id from the address; anything but a positive whole number is a page that does not exist. */
export function recordIdFrom(params: Params): number {
  const id = Number(params.id);
  if (!Number.isInteger(id) || id < 1) throw data(null, { status: 404, statusText: 'Not found' });
  return id;
}
