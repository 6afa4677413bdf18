/** Run-view glyphs drawn for Tracewright on the same 24 px grid and 2 px round stroke as the app's icons. */
export const BENCH_ICON_PATHS = {
  timer: ['M12 7a7 7 0 1 0 0 14a7 7 0 1 0 0-14z', 'M12 10.5V14l2.5 1.5', 'M10 2.5h4', 'M12 2.5V7', 'M18.5 6.5l1.5-1.5'],
  camera: ['M3 8h4l2-2.5h6L17 8h4v11H3z', 'M12 10.5a3.5 3.5 0 1 0 0 7a3.5 3.5 0 1 0 0-7z'],
  noSignal: ['M2.5 9a14 14 0 0 1 6-3.2', 'M12.5 5.6A14 14 0 0 1 21.5 9', 'M5.5 12.5a9 9 0 0 1 4-2.2', 'M15 11a9 9 0 0 1 3.5 1.5', 'M9 16a4.5 4.5 0 0 1 6 0', 'M12 19.5v.01', 'M3.5 3.5l17 17'],
  signal: ['M2.5 9a14 14 0 0 1 19 0', 'M5.5 12.5a9 9 0 0 1 13 0', 'M9 16a4.5 4.5 0 0 1 6 0', 'M12 19.5v.01'],
  list: ['M9 6h11', 'M9 12h11', 'M9 18h11', 'M4 5.5l1 1l2-2', 'M4 11.5l1 1l2-2', 'M4 17.5h3'],
  qr: ['M4 4h6v6H4z', 'M14 4h6v6h-6z', 'M4 14h6v6H4z', 'M14 14h2.5v2.5H14z', 'M18 18h2v2h-2z', 'M14 19.5v.01', 'M19.5 14v.01'],
  stop: ['M6.5 6.5h11v11h-11z'],
  bell: ['M6 16.5V11a6 6 0 0 1 12 0v5.5l1.5 2h-15z', 'M10 20.5a2 2 0 0 0 4 0'],
  shield: ['M12 3l7.5 3v5.5c0 4.5-3.2 8-7.5 9.5c-4.3-1.5-7.5-5-7.5-9.5V6z', 'M12 8v5', 'M12 16v.01'],
  glove: ['M7 21v-6.5L4.5 11a1.6 1.6 0 0 1 2.5-2l1 1.2V4.5a1.3 1.3 0 0 1 2.6 0V10', 'M10.6 9.5V3.5a1.3 1.3 0 0 1 2.6 0v6', 'M13.2 9.5V4.5a1.3 1.3 0 0 1 2.6 0v5.5', 'M15.8 10V7a1.3 1.3 0 0 1 2.6 0v7.5L16.5 21'],
  arrowRight: ['M5 12h14', 'M13 6l6 6l-6 6'],
} as const satisfies Record<string, readonly string[]>;

export type BenchIconName = keyof typeof BENCH_ICON_PATHS;
