/** The warning before a sign-out deletes changes that are only on this device, or null when none wait. */
export function waitingLossText(waiting: number, online: boolean): string | null {
  if (waiting === 0) return null;
  const what = waiting === 1 ? '1 change is' : `${waiting} changes are`;
  const hint = online
    ? 'Open Sync to send them first, or sign out and lose them.'
    : 'You are offline: wait for signal so they can be sent, or sign out and lose them.';
  return `${what} only on this device and not on the server yet. Signing out deletes this device’s copy of your work. ${hint}`;
}
