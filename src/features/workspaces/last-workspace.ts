/** The workspace last opened in this browser, so pages outside any workspace can link back to it. */
const KEY = 'ridewright.lastWorkspace';

export function rememberWorkspace(workspaceId: string): void {
  try {
    localStorage.setItem(KEY, workspaceId);
  } catch {
    // storage can be disabled; the app then falls back to the first membership
  }
}

export function lastWorkspace(): string | null {
  try {
    return localStorage.getItem(KEY);
  } catch {
    return null;
  }
}
