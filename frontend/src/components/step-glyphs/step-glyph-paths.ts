import type { StepKind } from '@tracewright/shared';

/**
 * One line glyph per step kind, drawn for Tracewright on a 24 px grid with a 2 px round stroke.
 * They share one neutral colour: the drawing and the kind's name tell kinds apart, not a hue.
 */
export const STEP_GLYPH_PATHS: Record<StepKind, readonly string[]> = {
  // Energy falling onto a bare surface: three rays with heads, above the film line.
  'surface-treatment': ['M3 20h18', 'M7 4v9', 'M12 4v10', 'M17 4v9', 'M5 11l2 2l2-2', 'M10 12l2 2l2-2', 'M15 11l2 2l2-2'],
  // A print head over the film, three drops on their way down.
  'print-pass': ['M5 4h14v5H5z', 'M8 12v1.5', 'M12 12v3', 'M16 12v1.5', 'M3 20h18'],
  // Vapour leaving a wet layer: three rising waves.
  dry: ['M3 20h18', 'M7 16c-1.5-1.5 1.5-3 0-4.5S8.5 8.5 7 7', 'M12 16c-1.5-1.5 1.5-3 0-4.5S13.5 8.5 12 7', 'M17 16c-1.5-1.5 1.5-3 0-4.5S18.5 8.5 17 7'],
  // A thermometer well past the middle: held at temperature.
  cure: ['M10 5a2 2 0 0 1 4 0v9.3a4 4 0 1 1-4 0z', 'M12 9v7.5', 'M17 6h3', 'M17 9.5h3'],
  // A platen coming down on the stacked sheets.
  transfer: ['M5 3h14v4H5z', 'M12 7v5', 'M9.5 9.5L12 12l2.5-2.5', 'M4 16h16', 'M4 20h16'],
  // A part with its legs resting on two pads.
  'attach-parts': ['M8 6h8v8H8z', 'M10 14v3', 'M14 14v3', 'M6 17h6', 'M12 17h6', 'M3 21h18'],
  // A loupe over a trace.
  inspect: ['M10 3.5a6 6 0 1 0 0 12a6 6 0 1 0 0-12z', 'M14.5 14l5.5 5.5', 'M7 9.5h6'],
};
