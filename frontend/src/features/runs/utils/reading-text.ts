/**
 * A reading with its unit, to six significant figures so float noise never shows while entered
 * values stay as typed; degrees of angle sit on the number.
 * @example readingText(11.56, 'Ω') // → '11.56 Ω'; readingText(72.5, '°') // → '72.5°'
 */
export function readingText(value: number, unit: string): string {
  const number = String(Number(value.toPrecision(6)));
  return unit.trim() === '°' ? `${number}°` : `${number} ${unit.trim()}`.trim();
}
