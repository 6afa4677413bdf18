/** The version being planned, from `?version=` in the address (so a recipe page can link straight here). */
export function versionParam(search: URLSearchParams): number | null {
  const id = Number(search.get('version'));
  return Number.isInteger(id) && id > 0 ? id : null;
}
