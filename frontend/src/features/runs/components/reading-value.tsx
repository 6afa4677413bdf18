import { Fragment } from 'react';

import { quantityText } from '@tracewright/shared';

import type { ReadingRow } from '../utils/reading-rows';

/** The value that stands, after any it replaced struck through (kept in the record, never erased). */
export function ReadingValue({ row }: { row: ReadingRow }) {
  const { current, replaced } = row;
  return (
    <>
      {replaced.map((old) => (
        <Fragment key={old.id}>
          <span className="sr-only">first recorded as </span>
          <del className="tabular text-graphite-600">{quantityText(old.value, old.unit)}</del>
          <span className="sr-only">, corrected to</span>{' '}
        </Fragment>
      ))}
      <span className="tabular font-bold">{quantityText(current.value, current.unit)}</span>
      {current.correctionReason ? <span className="block text-sm text-graphite-700">Correction: {current.correctionReason}</span> : null}
    </>
  );
}
