import type { z } from 'zod';

import type { InkInputSchema, SolventSchema, SubstrateInputSchema } from '@tracewright/shared';

// Demo data only, for the fictional Larkspur Soft Circuits Lab. Product names, makers and every
// number are invented to look plausible; they are never used as check values. Solvent hazard codes
// follow REFERENCES §7.2 as a reminder to read the real supplier's SDS.

type DemoInk = z.input<typeof InkInputSchema>;
type DemoSubstrate = z.input<typeof SubstrateInputSchema>;
type DemoSolvent = z.input<typeof SolventSchema>;

const ETHANOL: DemoSolvent = { name: 'Ethanol', casNumber: '64-17-5', hazardCodes: ['H225'], pictograms: ['GHS02'], signalWord: 'Danger' };
const ETHYLENE_GLYCOL: DemoSolvent = {
  name: 'Ethylene glycol',
  casNumber: '107-21-1',
  hazardCodes: ['H302', 'H373'],
  pictograms: ['GHS07', 'GHS08'],
  signalWord: 'Warning',
};
const WATER: DemoSolvent = { name: 'Water', casNumber: '7732-18-5' };

export const DEMO_INKS = {
  silver: {
    name: 'Quillmere QS-30 nanosilver ink',
    manufacturer: 'Quillmere Materials',
    function: 'conductor',
    viscosityMilliPaS: 12,
    surfaceTensionMilliNPerM: 31,
    surfaceTensionDispersiveMilliNPerM: 27.5,
    surfaceTensionPolarMilliNPerM: 3.5,
    densityKgPerM3: 1310,
    solidsWtPercent: 30,
    solidsDensityKgPerM3: 10_490,
    sheetResistanceOhmPerSq: 0.09,
    tcrPerK: 0.003,
    cureReferenceTempC: 150,
    cureReferenceMinutes: 30,
    activationEnergyKJPerMol: 60,
    minEffectiveCureTempC: 100,
    potLifeHours: 720,
    storageNotes: 'Fridge, 4–8 °C. Roll the bottle gently before use; do not shake.',
    solvents: [ETHANOL, ETHYLENE_GLYCOL],
    notes: 'Nanoparticle silver: nitrile gloves, print under the extraction arm, wipe spills at once.',
  },
  polymer: {
    name: 'Brightfen BP-1 conductive polymer ink',
    manufacturer: 'Brightfen Coatings',
    function: 'conductor',
    viscosityMilliPaS: 9,
    surfaceTensionMilliNPerM: 33,
    surfaceTensionDispersiveMilliNPerM: 23,
    surfaceTensionPolarMilliNPerM: 10,
    densityKgPerM3: 1010,
    solidsWtPercent: 1.1,
    sheetResistanceOhmPerSq: 220,
    cureReferenceTempC: 120,
    cureReferenceMinutes: 15,
    potLifeHours: 2160,
    storageNotes: 'Fridge; never freeze. Filter through 0.45 µm before loading a cartridge.',
    solvents: [WATER, ETHYLENE_GLYCOL],
    notes: 'PEDOT:PSS-type aqueous dispersion for transparent or stretchable traces.',
  },
  dielectric: {
    name: 'Quillmere QD-7 cover dielectric',
    manufacturer: 'Quillmere Materials',
    function: 'dielectric',
    viscosityMilliPaS: 14,
    surfaceTensionMilliNPerM: 30,
    densityKgPerM3: 1080,
    solidsWtPercent: 62,
    solidsDensityKgPerM3: 1150,
    cureReferenceTempC: 130,
    cureReferenceMinutes: 20,
    activationEnergyKJPerMol: 75,
    minEffectiveCureTempC: 90,
    potLifeHours: 336,
    storageNotes: 'Dark cupboard, below 25 °C. Light starts the cure.',
    solvents: [{ name: '1-Methoxy-2-propanol', casNumber: '107-98-2', hazardCodes: ['H226', 'H336'], pictograms: ['GHS02', 'GHS07'], signalWord: 'Warning' }],
    notes: 'UV/thermal: pin with the 395 nm lamp straight after printing, then the thermal cure.',
  },
  graphic: {
    name: 'Brightfen BK-8 graphic black',
    manufacturer: 'Brightfen Coatings',
    function: 'graphic',
    viscosityMilliPaS: 4.5,
    surfaceTensionMilliNPerM: 29,
    surfaceTensionDispersiveMilliNPerM: 25,
    surfaceTensionPolarMilliNPerM: 4,
    densityKgPerM3: 1040,
    solidsWtPercent: 8,
    solidsDensityKgPerM3: 1600,
    cureReferenceTempC: 80,
    cureReferenceMinutes: 5,
    solvents: [WATER, { name: 'Diethylene glycol', casNumber: '111-46-6', hazardCodes: ['H302'], pictograms: ['GHS07'], signalWord: 'Warning' }],
    notes: 'Black pigment ink for key legends and alignment marks.',
  },
} satisfies Record<string, DemoInk>;

export const DEMO_SUBSTRATES = {
  tpu: {
    name: 'Stretch TPU film, 50 µm',
    manufacturer: 'Fennmoor Polymers',
    substrateClass: 'tpu-film',
    thicknessUm: 50,
    waterContactAngleDeg: 82,
    diiodomethaneContactAngleDeg: 40,
    maxContinuousTempC: 110,
    maxShortExposureTempC: 150,
    maxShortExposureSeconds: 30,
    maxStrainPercent: 400,
    notes: 'Ester-based. Tape to a glass carrier for printing; lens-wrap heaters live here.',
  },
  pet: {
    name: 'Clear PET film, 125 µm, heat-stabilised',
    manufacturer: 'Fennmoor Polymers',
    substrateClass: 'pet-film',
    thicknessUm: 125,
    surfaceEnergyDispersiveMilliNPerM: 40.5,
    surfaceEnergyPolarMilliNPerM: 4.5,
    maxContinuousTempC: 120,
    maxShortExposureTempC: 150,
    maxShortExposureSeconds: 60,
    maxStrainPercent: 3,
    notes: 'For the four-key touch strip. Shrinks above its limits: keep cures at or below 120 °C.',
  },
  tattoo: {
    name: 'Skin-transfer tattoo paper',
    manufacturer: 'Mirecroft Papers',
    substrateClass: 'tattoo-paper',
    thicknessUm: 110,
    waterContactAngleDeg: 64,
    diiodomethaneContactAngleDeg: 36,
    maxContinuousTempC: 90,
    maxShortExposureTempC: 130,
    maxShortExposureSeconds: 20,
    isTransferCarrier: true,
    notes: 'Transfer carrier: print mirrored, laminate the adhesive sheet, release with water.',
  },
  textile: {
    name: 'Light-fabric transfer sheet',
    manufacturer: 'Mirecroft Papers',
    substrateClass: 'textile-transfer-sheet',
    thicknessUm: 120,
    maxContinuousTempC: 100,
    maxShortExposureTempC: 175,
    maxShortExposureSeconds: 15,
    isTransferCarrier: true,
    notes: 'Heat press onto cotton or blends; peel while warm.',
  },
  paper: {
    name: 'Microporous coated paper, 180 g/m²',
    manufacturer: 'Mirecroft Papers',
    substrateClass: 'coated-paper',
    thicknessUm: 180,
    surfaceEnergyDispersiveMilliNPerM: 38,
    surfaceEnergyPolarMilliNPerM: 14,
    maxContinuousTempC: 120,
    maxShortExposureTempC: 150,
    maxShortExposureSeconds: 120,
    notes: 'For the interdigitated humidity-sensing label.',
  },
} satisfies Record<string, DemoSubstrate>;

/** Dates count in days from the day of seeding, so the demo always shows the same situations. */
export const DEMO_LOTS: Array<{
  material: ['ink', keyof typeof DEMO_INKS] | ['substrate', keyof typeof DEMO_SUBSTRATES];
  lotNumber: string;
  receivedDay: number;
  openedDay: number | null;
  expiresDay: number | null;
  notes?: string;
}> = [
  // Opened 40 days ago with a 30-day pot life: flagged past pot life.
  { material: ['ink', 'silver'], lotNumber: 'QS30-2609', receivedDay: -60, openedDay: -40, expiresDay: 120, notes: 'Half used; check before the next run.' },
  { material: ['ink', 'silver'], lotNumber: 'QS30-2611', receivedDay: -10, openedDay: null, expiresDay: 170 },
  // Never opened, but past its expiry date: flagged expired.
  { material: ['ink', 'dielectric'], lotNumber: 'QD7-2604', receivedDay: -200, openedDay: null, expiresDay: -8 },
  { material: ['ink', 'polymer'], lotNumber: 'BP1-0917', receivedDay: -30, openedDay: -5, expiresDay: 150 },
  { material: ['ink', 'graphic'], lotNumber: 'BK8-0822', receivedDay: -50, openedDay: -45, expiresDay: 300 },
  { material: ['substrate', 'tpu'], lotNumber: 'FM-TPU-4471', receivedDay: -45, openedDay: -20, expiresDay: null },
  { material: ['substrate', 'pet'], lotNumber: 'FM-PET-1208', receivedDay: -90, openedDay: -85, expiresDay: null },
  { material: ['substrate', 'tattoo'], lotNumber: 'MC-TT-0330', receivedDay: -15, openedDay: null, expiresDay: 350 },
];
