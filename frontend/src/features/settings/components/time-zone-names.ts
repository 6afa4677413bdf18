/** The zones this browser knows, for the datalist; the server checks the saved value itself. */
export function timeZoneNames(): string[] {
  try {
    return Intl.supportedValuesOf('timeZone');
  } catch {
    return [];
  }
}
