// Small wording helpers the run rules share; numberText and quantityText are public, for screens too.

/**
 * A number as a person entered or would read it: up to 6 significant figures, so float noise
 * (10.000000000000002) never reaches a message while entered values (10.05) stay as typed.
 * @example numberText(10.000000000000002) // → '10'; numberText(10.05) // → '10.05'
 */
export function numberText(value: number): string {
  if (!Number.isFinite(value)) return String(value);
  return String(Number(value.toPrecision(6)));
}

/**
 * A value with its unit; degrees of angle sit on the number, every other unit after a space.
 * @example quantityText(72.5, '°') // → '72.5°'; quantityText(3.2, 'Ω') // → '3.2 Ω'
 */
export function quantityText(value: number, unit: string): string {
  const trimmed = unit.trim();
  if (trimmed === '') return numberText(value);
  return trimmed === '°' ? `${numberText(value)}°` : `${numberText(value)} ${trimmed}`;
}

/**
 * How a step is named in a sentence: its 1-based number and title.
 * @example stepRefText({ number: 5, title: 'Inspect heater' }) // → 'step 5 “Inspect heater”'
 */
export function stepRefText(step: StepRef): string {
  return `step ${step.number} “${step.title}”`;
}

/** A step as messages name it: 1-based position in the recipe and its title. */
export interface StepRef {
  number: number;
  title: string;
}
