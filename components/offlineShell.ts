/** Native builds load their bundle from the device; nothing to register. */
export function registerOfflineShell(): void {}
