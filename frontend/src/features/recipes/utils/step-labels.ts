import type { ATTACH_METHODS, DRY_METHODS, HEAT_SOURCE_KINDS, TREATMENT_METHODS, VersionState } from '@tracewright/shared';

export const TREATMENT_METHOD_LABELS: Record<(typeof TREATMENT_METHODS)[number], string> = {
  plasma: 'Plasma',
  corona: 'Corona',
  'uv-ozone': 'UV-ozone',
  'primer-coat': 'Primer coat',
  'solvent-wipe': 'Solvent wipe',
};

export const DRY_METHOD_LABELS: Record<(typeof DRY_METHODS)[number], string> = {
  air: 'In air',
  oven: 'In an oven',
  'hot-plate': 'On a hot plate',
  'heat-gun': 'With a heat gun',
};

export const ATTACH_METHOD_LABELS: Record<(typeof ATTACH_METHODS)[number], string> = {
  'z-axis-tape': 'Z-axis conductive tape',
  'conductive-thread': 'Conductive thread',
  'low-temp-solder': 'Low-temperature solder',
  'conductive-adhesive': 'Conductive adhesive',
};

export const PEEL_LABELS = { hot: 'Peel hot', cold: 'Peel cold' } as const;

export const HEAT_SOURCE_KIND_LABELS: Record<(typeof HEAT_SOURCE_KINDS)[number], string> = {
  oven: 'oven',
  'hot-plate': 'hot plate',
  'heat-press': 'heat press',
  'heat-gun': 'heat gun',
};

export const VERSION_STATE_LABELS: Record<VersionState, string> = {
  draft: 'Draft',
  'in-review': 'In review',
  released: 'Released',
  retired: 'Retired',
};
