/**
 * What the browser says about the network, for tests: `navigator.onLine` and the online/offline
 * events the page listens to.
 */
export function setBrowserOnline(isOnline: boolean): void {
  Object.defineProperty(navigator, 'onLine', { configurable: true, get: () => isOnline });
  window.dispatchEvent(new Event(isOnline ? 'online' : 'offline'));
}

export function restoreBrowserOnline(): void {
  Reflect.deleteProperty(navigator, 'onLine');
}
