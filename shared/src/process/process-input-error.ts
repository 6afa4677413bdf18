/**
 * Thrown when a process calculation gets a non-physical input (negative viscosity, NaN, a contact
 * angle outside 0–180°, an empty series). `field` names the offending input so a form can mark it.
 *
 * @example
 * // new ProcessInputError('viscosityMilliPaS', 'Viscosity (mPa·s) must be above 0; got -1.')
 * // → error.field === 'viscosityMilliPaS'
 */
export class ProcessInputError extends Error {
  override name = 'ProcessInputError';
  readonly field: string;

  constructor(field: string, message: string) {
    super(message);
    this.field = field;
  }
}
