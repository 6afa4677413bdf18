import { http, HttpResponse } from 'msw';

import type { Ink, InkPrintability, LotView, Printer, Substrate } from '@tracewright/shared';

// Invented values for tests only; they are never used as check values.
// The records themselves are built by test/catalogue-records, shared with the other features.

type Fit = InkPrintability['printers'][number];
type Result = Fit['windows'][number]['result'];

/** One printer's fit, the same numbers under both windows unless told otherwise. */
export function aFit(printer: { id: number; name: string }, result: Partial<Result>, alternative: Partial<Result> = {}): Fit {
  const base: Result = { ohnesorge: 0.15, z: 6.8, reynolds: 24, weber: 12, splashParameter: 7.7, verdict: 'jettable', reasons: [], ...result };
  return {
    printerId: printer.id,
    printerName: printer.name,
    nozzleDiameterUm: 21,
    jettingSpeedMetresPerSecond: 6,
    problem: null,
    windows: [
      { windowId: 'reis-derby', label: '1 < Z < 10', source: 'Reis & Derby 2000', isDefault: true, result: base },
      { windowId: 'jang-kim-moon', label: '4 ≤ Z ≤ 14', source: 'Jang, Kim & Moon 2009', isDefault: false, result: { ...base, ...alternative } },
    ],
  };
}

/** The list endpoints answer with these records (archived ones included, as the page asks for all). */
export function catalogueLists(lists: { inks?: Ink[]; substrates?: Substrate[]; lots?: LotView[]; printers?: Printer[] }) {
  return [
    http.get('/api/inks', () => HttpResponse.json({ inks: lists.inks ?? [] })),
    http.get('/api/substrates', () => HttpResponse.json({ substrates: lists.substrates ?? [] })),
    http.get('/api/lots', () => HttpResponse.json({ lots: lists.lots ?? [] })),
    http.get('/api/printers', () => HttpResponse.json({ printers: lists.printers ?? [] })),
  ];
}
