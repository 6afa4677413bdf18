/**
 * Our own line glyphs on a 24 px grid, drawn for a 2 px round stroke. Each entry is a list of
 * SVG path `d` strings; keep them simple so they stay readable at 16 px.
 */
export const ICON_PATHS = {
  check: ['M4 12.5l5 5L20 6.5'],
  warning: ['M12 3.5L2.5 20h19L12 3.5z', 'M12 10v4.5', 'M12 17.5v.01'],
  blocked: ['M12 3a9 9 0 1 0 0 18a9 9 0 1 0 0-18z', 'M5.6 5.6l12.8 12.8'],
  info: ['M12 3a9 9 0 1 0 0 18a9 9 0 1 0 0-18z', 'M12 11v6', 'M12 7.5v.01'],
  envelope: ['M3.5 6h17v12h-17z', 'M3.5 6.5l8.5 7l8.5-7'],
  paused: ['M12 3a9 9 0 1 0 0 18a9 9 0 1 0 0-18z', 'M8 12h8'],
  home: ['M4 11l8-6.5l8 6.5', 'M6 9.5V20h12V9.5', 'M10 20v-5h4v5'],
  people: ['M9 4.5a3.5 3.5 0 1 0 0 7a3.5 3.5 0 1 0 0-7z', 'M2.5 20c.5-3.5 3-5.5 6.5-5.5s6 2 6.5 5.5', 'M16 5a3 3 0 0 1 0 6', 'M18 14.5c2 .7 3.2 2.5 3.5 5.5'],
  sliders: ['M4 7h9', 'M17 7h3', 'M15 5v4', 'M4 17h3', 'M11 17h9', 'M9 15v4'],
  outbox: ['M4 13v6h16v-6', 'M12 3v11', 'M8 7l4-4l4 4'],
  ledger: ['M6 3h12v18H6z', 'M9 8h6', 'M9 12h6', 'M9 16h3'],
  keypad: ['M5 4h3v3H5z', 'M10.5 4h3v3h-3z', 'M16 4h3v3h-3z', 'M5 10h3v3H5z', 'M10.5 10h3v3h-3z', 'M16 10h3v3h-3z', 'M10.5 16h3v3h-3z'],
  exit: ['M10 4H5v16h5', 'M14 8l4 4l-4 4', 'M9 12h9'],
  swap: ['M4 8h14', 'M15 5l3 3l-3 3', 'M20 16H6', 'M9 13l-3 3l3 3'],
  close: ['M6 6l12 12', 'M18 6L6 18'],
  chevronRight: ['M9 5l7 7l-7 7'],
  chevronDown: ['M5 9l7 7l7-7'],
  sortUp: ['M12 19V5', 'M6 11l6-6l6 6'],
  sortDown: ['M12 5v14', 'M6 13l6 6l6-6'],
  sortNone: ['M8 9l4-4l4 4', 'M8 15l4 4l4-4'],
  refresh: ['M19.5 12a7.5 7.5 0 1 1-2.2-5.3', 'M20 4v5h-5'],
  arrowLeft: ['M19 12H5', 'M11 6l-6 6l6 6'],
  backspace: ['M8 5h12v14H8l-5-7z', 'M11 9l6 6', 'M17 9l-6 6'],
  flask: ['M9 3h6', 'M10 3v6.5L4.8 18.6A1.6 1.6 0 0 0 6.2 21h11.6a1.6 1.6 0 0 0 1.4-2.4L14 9.5V3', 'M7.4 15h9.2'],
  printer: ['M7 8V3.5h10V8', 'M7 17H4V8h16v9h-3', 'M7 13.5h10V21H7z', 'M16.5 10.5v.01'],
  calculator: ['M6 3h12v18H6z', 'M9 6.5h6v3H9z', 'M9 13v.01', 'M12 13v.01', 'M15 13v.01', 'M9 17v.01', 'M12 17v.01', 'M15 17v.01'],
  plus: ['M12 5v14', 'M5 12h14'],
  pencil: ['M4 20l1-4.5L15.5 5a2.1 2.1 0 0 1 3 3L8 18.5z', 'M13.5 7l3 3'],
  archive: ['M3.5 4.5h17v4h-17z', 'M5 8.5V20h14V8.5', 'M10 12.5h4'],
  trash: ['M4 7h16', 'M9 7V4h6v3', 'M6.5 7l1 13h9l1-13', 'M10.5 11v5.5', 'M13.5 11v5.5'],
  hourglass: ['M7 3h10', 'M7 21h10', 'M8 3v3.5l4 5.5l-4 5.5V21', 'M16 3v3.5L12 12l4 5.5V21'],
  drop: ['M12 3.5C9 8 6.5 11 6.5 14.5a5.5 5.5 0 0 0 11 0C17.5 11 15 8 12 3.5z'],
  // A clipboard with a ticked line: a run and its traveller.
  clipboard: ['M9 4h6v3H9z', 'M9 5.5H6v15h12v-15h-3', 'M9 13l2 2 4-4'],
  // A line that climbs across a frame: trends over runs.
  trend: ['M4 4v16h16', 'M7 15l4-4 3 3 5-6'],
  // A clock face with a turning arrow: the history of changes.
  history: ['M4 12a8 8 0 1 0 2.3-5.6', 'M4 4v4h4', 'M12 8v4l3 2'],
} as const satisfies Record<string, readonly string[]>;

export type IconName = keyof typeof ICON_PATHS;
