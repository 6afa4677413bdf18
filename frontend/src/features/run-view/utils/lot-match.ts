import type { RunDetail } from '@tracewright/shared';

type Lot = RunDetail['lots'][number];

/**
 * The lot a scanned label names: its lot number as printed, or a link to the lot's page
 * (…/lots/<id>). Only lots offered (this run's lots of the step's ink) can match.
 * @example matchLot('lot-2026-113', [{ lotId: 4, lotNumber: 'LOT-2026-113', … }]) // → that lot
 */
export function matchLot(text: string, lots: readonly Lot[]): Lot | null {
  const wanted = text.trim().toLowerCase();
  const byNumber = lots.find((lot) => lot.lotNumber.trim().toLowerCase() === wanted);
  if (byNumber) return byNumber;
  const linked = /\/lots\/(\d+)\/?(?:[?#].*)?$/.exec(wanted);
  const id = linked?.[1] ? Number(linked[1]) : null;
  return lots.find((lot) => lot.lotId === id) ?? null;
}
