import type {
  HEAT_SOURCE_KINDS,
  INK_FUNCTIONS,
  INSTRUMENT_KINDS,
  SubstrateClass,
  TREATMENT_METHODS,
} from '@tracewright/shared';

// The words a technician reads for each stored code. Display only; the codes are the schema's.

export const INK_FUNCTION_LABELS: Record<(typeof INK_FUNCTIONS)[number], string> = {
  conductor: 'Conductor',
  dielectric: 'Dielectric',
  graphic: 'Graphic',
};

export const SUBSTRATE_CLASS_LABELS: Record<SubstrateClass, string> = {
  'tpu-film': 'TPU film',
  'pet-film': 'PET film',
  'pen-film': 'PEN film',
  'polyimide-film': 'Polyimide film',
  'transfer-paper': 'Temporary-transfer paper',
  'tattoo-paper': 'Tattoo paper',
  'textile-transfer-sheet': 'Textile-transfer sheet',
  'thermoplastic-sheet': 'Heat-formable thermoplastic sheet',
  textile: 'Textile',
  'coated-paper': 'Coated paper',
  other: 'Other',
};

export const HEAT_SOURCE_KIND_LABELS: Record<(typeof HEAT_SOURCE_KINDS)[number], string> = {
  oven: 'Oven',
  'hot-plate': 'Hot plate',
  'heat-press': 'Heat press',
  'heat-gun': 'Heat gun',
};

export const TREATMENT_METHOD_LABELS: Record<(typeof TREATMENT_METHODS)[number], string> = {
  plasma: 'Plasma',
  corona: 'Corona',
  'uv-ozone': 'UV-ozone',
  'primer-coat': 'Primer coat',
  'solvent-wipe': 'Solvent wipe',
};

export const INSTRUMENT_KIND_LABELS: Record<(typeof INSTRUMENT_KINDS)[number], string> = {
  multimeter: 'Multimeter',
  'four-point-probe': 'Four-point probe',
  'contact-angle-goniometer': 'Contact-angle goniometer',
  'thermocouple-logger': 'Thermocouple logger',
  micrometer: 'Micrometer',
  microscope: 'Microscope',
  other: 'Other',
};
