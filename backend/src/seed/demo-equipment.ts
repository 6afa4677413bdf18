import type { DEMO_INKS } from './demo-materials';

// Demo data only, for the fictional Larkspur Soft Circuits Lab: invented names and numbers.
// Calibration dates count in days from the day of seeding, so the demo always shows one
// instrument overdue and one due soon.

export const DEMO_PRINTERS: Array<{
  name: string;
  model: string;
  nozzleDiameterUm: number;
  dropVolumePl: number;
  jettingSpeedMetresPerSecond: number;
  nativeDpi: number;
  channels: Array<{ name: string; ink: keyof typeof DEMO_INKS | null }>;
  notes: string;
}> = [
  {
    name: 'Bench printer North',
    model: 'Wrenhaven WB-21 bench jetter',
    nozzleDiameterUm: 21,
    dropVolumePl: 10,
    jettingSpeedMetresPerSecond: 6,
    nativeDpi: 1270,
    channels: [
      { name: 'Ag conductor', ink: 'silver' },
      { name: 'Cover dielectric', ink: 'dielectric' },
      { name: 'Spare', ink: null },
    ],
    notes: 'Fine lines and covers. Purge the silver channel at the start of every shift.',
  },
  {
    name: 'Bench printer South',
    model: 'Wrenhaven WB-50 bench jetter',
    nozzleDiameterUm: 50,
    dropVolumePl: 35,
    jettingSpeedMetresPerSecond: 5,
    nativeDpi: 600,
    channels: [
      { name: 'Polymer conductor', ink: 'polymer' },
      { name: 'Graphic black', ink: 'graphic' },
    ],
    notes: 'Wide traces, electrodes and legends.',
  },
];

export const DEMO_HEAT_SOURCES = [
  { name: 'Convection oven O-1', kind: 'oven', maxTempC: 250, calibrationDay: 95, notes: 'Cure steps. Log with the thermocouple logger on the middle shelf.' },
  { name: 'Hot plate HP-2', kind: 'hot-plate', maxTempC: 300, calibrationDay: 200, notes: 'Drying between layers; aluminium spreader plate fitted.' },
  { name: 'Heat press HX-1', kind: 'heat-press', maxTempC: 230, calibrationDay: 30, notes: 'Transfers. Platen stays hot for 20 min after switch-off.' },
  { name: 'Heat gun G-1', kind: 'heat-gun', maxTempC: 550, calibrationDay: null, notes: 'Not calibrated: softening TPU edges only, never for a cure step.' },
] as const;

export const DEMO_SURFACE_TREATERS = [
  { name: 'Plasma wand P-1', method: 'plasma', calibrationDay: 60, notes: 'Atmospheric plasma; 2 passes at 10 mm/s before printing on TPU.' },
  { name: 'Solvent-wipe station W-1', method: 'solvent-wipe', calibrationDay: null, notes: 'Isopropanol and lint-free wipes; extraction on, no open flames.' },
] as const;

export const DEMO_INSTRUMENTS = [
  { name: 'Bench multimeter M-3', kind: 'multimeter', serialNumber: 'LK-MM-0031', calibrationDay: 150, notes: '' },
  { name: 'Four-point probe FP-1', kind: 'four-point-probe', serialNumber: 'LK-FP-0007', calibrationDay: 10, notes: 'Sheet resistance of test coupons.' },
  { name: 'Contact-angle goniometer CA-1', kind: 'contact-angle-goniometer', serialNumber: 'LK-CA-0002', calibrationDay: -21, notes: 'Water and diiodomethane drops, 2 µL.' },
  { name: 'Thermocouple logger TL-2', kind: 'thermocouple-logger', serialNumber: 'LK-TL-0014', calibrationDay: 300, notes: 'Oven and press profiles.' },
] as const;
