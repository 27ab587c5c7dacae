/** Native builds load their bundle from the device; nothing to register. */
export function registerOfflineShell(): void {}

/** Always ready on native: the bundle is on the device. */
export function offlineShellReady(): boolean {
  return true;
}
