import { jettability } from '../process/jettability';
import { DEFAULT_JETTING_WINDOW, JETTING_WINDOWS, type JettingWindowId } from '../process/jetting-windows';
import { DIIODOMETHANE_PROBE, WATER_PROBE } from '../process/probe-liquids';
import { ProcessInputError } from '../process/process-input-error';
import { formatNumber as f } from '../process/units';
import { owrkSurfaceEnergy, predictedContactAngleDeg } from '../process/wetting';
import { DEFAULT_WETTING_MARGIN_MILLI_N_PER_M, wettingMargin } from '../process/wetting-margin';
import type { Printer } from '../schemas/equipment.schema';
import type {
  InkPrintability,
  InkWetting,
  SubstrateSurfaceEnergy,
  SubstrateWetting,
} from '../schemas/material-fit.schema';
import type { Ink, Substrate } from '../schemas/material.schema';

// How well a material suits the lab's equipment and other materials: an ink against every
// printer (jettability), a substrate against every ink (wetting). Pure: the caller loads records.

export type InkForPrinting = Pick<
  Ink,
  'id' | 'name' | 'viscosityMilliPaS' | 'surfaceTensionMilliNPerM' | 'densityKgPerM3' | 'solidsWtPercent' | 'solidsDensityKgPerM3'
>;
export type PrinterForPrinting = Pick<Printer, 'id' | 'name' | 'nozzleDiameterUm' | 'jettingSpeedMetresPerSecond'>;
export type InkForWetting = Pick<
  Ink,
  'id' | 'name' | 'surfaceTensionMilliNPerM' | 'surfaceTensionDispersiveMilliNPerM' | 'surfaceTensionPolarMilliNPerM'
>;
export type SubstrateForWetting = Pick<
  Substrate,
  | 'id'
  | 'name'
  | 'surfaceEnergyDispersiveMilliNPerM'
  | 'surfaceEnergyPolarMilliNPerM'
  | 'waterContactAngleDeg'
  | 'diiodomethaneContactAngleDeg'
>;

// The default window first, then every alternative, so a screen can show them side by side.
const WINDOW_IDS: JettingWindowId[] = [
  DEFAULT_JETTING_WINDOW,
  ...(Object.keys(JETTING_WINDOWS) as JettingWindowId[]).filter((id) => id !== DEFAULT_JETTING_WINDOW),
];

/**
 * Runs one calculation; a value no real material has (a record saved before a rule existed)
 * becomes a problem on that row instead of failing the whole view.
 */
function attempt<T>(compute: () => T, whose: string): { value: T; problem: null } | { value: null; problem: string } {
  try {
    return { value: compute(), problem: null };
  } catch (error) {
    if (!(error instanceof ProcessInputError)) throw error;
    return { value: null, problem: `Cannot judge this ${whose}: ${error.message} Correct the record.` };
  }
}

/**
 * Volume fraction of solids in an ink: φv = w·ρink/ρsolids. The ink's own density already holds
 * the carrier's, so no carrier density is needed (same result as the mixture form
 * φv = (w/ρs)/(w/ρs + (1 − w)/ρc) in process/film-thickness.ts).
 *
 * @example
 * // 20 wt % silver (10 490 kg/m³) in an ink of 1220.9 kg/m³ → value 0.02328
 * inkSolidsVolumeFraction({ solidsWtPercent: 20, densityKgPerM3: 1220.9, solidsDensityKgPerM3: 10490 })
 */
export function inkSolidsVolumeFraction(
  ink: Pick<Ink, 'solidsWtPercent' | 'densityKgPerM3' | 'solidsDensityKgPerM3'>,
): { value: number | null; note: string } {
  if (ink.solidsWtPercent === 0) return { value: 0, note: 'No solids: nothing stays on the substrate once the ink dries.' };
  if (ink.solidsDensityKgPerM3 === null) {
    return { value: null, note: 'Record the solids density to estimate how much of the wet film stays as solids.' };
  }
  const value = ((ink.solidsWtPercent / 100) * ink.densityKgPerM3) / ink.solidsDensityKgPerM3;
  if (!(value > 0 && value <= 1)) {
    return { value: null, note: 'The solids density is lower than the ink can hold at this solids content; check both densities.' };
  }
  const expression = `${f(ink.solidsWtPercent / 100)} × ${f(ink.densityKgPerM3)} / ${f(ink.solidsDensityKgPerM3)}`;
  return { value, note: `φv = ${expression} = ${f(value)}: ${f(value * 100)} % of the wet film's volume stays as solids.` };
}

/**
 * The ink through every printer given, judged against each printable window (default first).
 *
 * @example
 * // 50 wt % glycerol–water (6.00 mPa·s, 70 mN/m, 1126 kg/m³) through 21 µm at 6 m/s
 * inkPrintability(ink, [{ id: 1, name: 'Bench', nozzleDiameterUm: 21, jettingSpeedMetresPerSecond: 6 }])
 * // → printers[0].windows[0].result.z ≈ 6.782, verdict 'jettable' in 1 < Z < 10 and in 4 ≤ Z ≤ 14
 */
export function inkPrintability(ink: InkForPrinting, printers: readonly PrinterForPrinting[]): InkPrintability {
  const phi = inkSolidsVolumeFraction(ink);
  return {
    inkId: ink.id,
    inkName: ink.name,
    solidsVolumeFraction: phi.value,
    solidsVolumeFractionNote: phi.note,
    printers: printers.map((printer) => {
      const windows = attempt(
        () =>
          WINDOW_IDS.map((windowId) => ({
            windowId,
            label: JETTING_WINDOWS[windowId].label,
            source: JETTING_WINDOWS[windowId].source,
            isDefault: windowId === DEFAULT_JETTING_WINDOW,
            result: jettability({
              viscosityMilliPaS: ink.viscosityMilliPaS,
              surfaceTensionMilliNPerM: ink.surfaceTensionMilliNPerM,
              densityKgPerM3: ink.densityKgPerM3,
              nozzleDiameterUm: printer.nozzleDiameterUm,
              dropVelocityMetresPerSecond: printer.jettingSpeedMetresPerSecond,
              window: windowId,
            }),
          })),
        'ink and printer pair',
      );
      return {
        printerId: printer.id,
        printerName: printer.name,
        nozzleDiameterUm: printer.nozzleDiameterUm,
        jettingSpeedMetresPerSecond: printer.jettingSpeedMetresPerSecond,
        windows: windows.value ?? [],
        problem: windows.problem,
      };
    }),
  };
}

/**
 * A substrate's surface free energy: its recorded parts when it has them, else OWRK from its water
 * and diiodomethane contact angles, else null with what to record.
 *
 * @example
 * substrateSurfaceEnergy({ ...film, waterContactAngleDeg: 72.5, diiodomethaneContactAngleDeg: 27 })
 * // → energy { source: 'owrk-contact-angles', dispersive 45.414, polar 4.945, total 50.359 }
 */
export function substrateSurfaceEnergy(substrate: SubstrateForWetting): { energy: SubstrateSurfaceEnergy | null; note: string } {
  const d = substrate.surfaceEnergyDispersiveMilliNPerM;
  const p = substrate.surfaceEnergyPolarMilliNPerM;
  const water = substrate.waterContactAngleDeg;
  const dim = substrate.diiodomethaneContactAngleDeg;
  let energy: SubstrateSurfaceEnergy;
  let note: string;
  if (d !== null && p !== null) {
    energy = { source: 'recorded-parts', dispersiveMilliNPerM: d, polarMilliNPerM: p, totalMilliNPerM: d + p };
    note = `Recorded parts: ${f(d)} dispersive + ${f(p)} polar = ${f(d + p)} mN/m.`;
  } else if (water !== null && dim !== null) {
    const owrk = attempt(() => owrkSurfaceEnergy({ waterAngleDeg: water, diiodomethaneAngleDeg: dim }), 'substrate');
    if (owrk.value === null) return { energy: null, note: owrk.problem };
    energy = { source: 'owrk-contact-angles', ...owrk.value };
    note =
      `From contact angles by OWRK (Owens & Wendt 1969): water ${f(water)}°, diiodomethane ${f(dim)}° → ` +
      `${f(energy.dispersiveMilliNPerM)} + ${f(energy.polarMilliNPerM)} = ${f(energy.totalMilliNPerM)} mN/m ` +
      `(probe liquids: water ${WATER_PROBE.totalMilliNPerM} = ${WATER_PROBE.dispersiveMilliNPerM} + ${WATER_PROBE.polarMilliNPerM}, ` +
      `diiodomethane ${DIIODOMETHANE_PROBE.totalMilliNPerM} mN/m).`;
  } else {
    return {
      energy: null,
      note: 'No surface energy recorded: enter its dispersive and polar parts, or its water and diiodomethane contact angles.',
    };
  }
  if (energy.totalMilliNPerM <= 0) {
    return { energy: null, note: 'A surface energy of 0 mN/m is not physical; check the recorded values.' };
  }
  return { energy, note };
}

/**
 * One ink on a surface of known (or unknown) energy: the wetting margin and, when the ink's parts
 * are known, the OWRK contact angle.
 *
 * @example
 * // an ink of 28.0 = 26.0 + 2.0 mN/m on a 45.414 + 4.945 mN/m surface
 * inkWetting(ink, { source: 'recorded-parts', dispersiveMilliNPerM: 45.414, polarMilliNPerM: 4.945, totalMilliNPerM: 50.359 })
 * // → margin { marginMilliNPerM: 22.359, ok: true }, predictedContactAngleDeg 0 (spreads)
 */
export function inkWetting(
  ink: InkForWetting,
  energy: SubstrateSurfaceEnergy | null,
  requiredMarginMilliNPerM = DEFAULT_WETTING_MARGIN_MILLI_N_PER_M,
): InkWetting {
  const base = { inkId: ink.id, inkName: ink.name, inkSurfaceTensionMilliNPerM: ink.surfaceTensionMilliNPerM };
  if (energy === null) {
    return { ...base, margin: null, predictedContactAngleDeg: null, reasons: ["The substrate's surface energy is unknown, so wetting cannot be judged."] };
  }
  const judged = attempt(
    () =>
      wettingMargin({
        inkSurfaceTensionMilliNPerM: ink.surfaceTensionMilliNPerM,
        substrateSurfaceEnergyMilliNPerM: energy.totalMilliNPerM,
        requiredMarginMilliNPerM,
      }),
    'ink',
  );
  if (judged.value === null) return { ...base, margin: null, predictedContactAngleDeg: null, reasons: [judged.problem] };
  const margin = judged.value;
  const asked = `the ${f(requiredMarginMilliNPerM)} mN/m asked for (common practice, no source)`;
  const m = margin.marginMilliNPerM;
  const reasons = [
    margin.ok
      ? `Surface energy exceeds the ink's surface tension by ${f(m)} mN/m, meeting ${asked}: the ink should wet.`
      : `Surface energy ${m < 0 ? `is ${f(-m)} mN/m below` : `exceeds by only ${f(m)} mN/m`} the ink's surface tension, short of ${asked}: expect poor wetting; treat the surface or pick another ink.`,
  ];
  const d = ink.surfaceTensionDispersiveMilliNPerM;
  const p = ink.surfaceTensionPolarMilliNPerM;
  if (d === null || p === null) {
    reasons.push("Record the ink's dispersive and polar parts to predict its contact angle.");
    return { ...base, margin, predictedContactAngleDeg: null, reasons };
  }
  const angle = attempt(() => predictedContactAngleDeg({ liquid: { dispersiveMilliNPerM: d, polarMilliNPerM: p }, solid: energy }), 'ink');
  if (angle.value === null) return { ...base, margin, predictedContactAngleDeg: null, reasons: [...reasons, angle.problem] };
  reasons.push(angle.value === 0 ? 'Predicted to spread completely (OWRK gives cos θ ≥ 1).' : `Predicted contact angle ${f(angle.value)}° (OWRK).`);
  return { ...base, margin, predictedContactAngleDeg: angle.value, reasons };
}

/**
 * A substrate against every ink given.
 *
 * @example
 * substrateWetting({ ...film, surfaceEnergyDispersiveMilliNPerM: 45, surfaceEnergyPolarMilliNPerM: 5 }, [inkOf40])
 * // → surfaceEnergy.totalMilliNPerM 50; inks[0].margin { marginMilliNPerM: 10, ok: true }
 */
export function substrateWetting(
  substrate: SubstrateForWetting,
  inks: readonly InkForWetting[],
  requiredMarginMilliNPerM = DEFAULT_WETTING_MARGIN_MILLI_N_PER_M,
): SubstrateWetting {
  const { energy, note } = substrateSurfaceEnergy(substrate);
  return {
    substrateId: substrate.id,
    substrateName: substrate.name,
    surfaceEnergy: energy,
    surfaceEnergyNote: note,
    requiredMarginMilliNPerM,
    inks: inks.map((ink) => inkWetting(ink, energy, requiredMarginMilliNPerM)),
  };
}
