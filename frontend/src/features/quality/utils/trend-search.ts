/** The chosen reading spec lives in the address (?recipeId=&specId=), so a trend can be bookmarked. */
export type TrendChoice = { recipeId: number; specId: string } | null;

export function trendChoiceOf(params: URLSearchParams): TrendChoice {
  const recipeId = Number(params.get('recipeId'));
  const specId = params.get('specId')?.trim() ?? '';
  if (!Number.isInteger(recipeId) || recipeId < 1 || specId === '' || specId.length > 40) return null;
  return { recipeId, specId };
}

export function trendSearchFor(choice: TrendChoice): string {
  if (!choice) return '';
  return `?${new URLSearchParams({ recipeId: String(choice.recipeId), specId: choice.specId }).toString()}`;
}

/**
 * The address's choice when the spec list (specs with readings) has it; a bookmark of a spec that
 * is gone or has no readings is treated as no choice, so the page offers the list.
 */
export function listedChoice(choice: TrendChoice, specs: ReadonlyArray<{ recipeId: number; specId: string }>): TrendChoice {
  return choice && specs.some((s) => s.recipeId === choice.recipeId && s.specId === choice.specId) ? choice : null;
}
