// The team last opened in this browser, so the console reopens it next time.
const storageKey = 'leastline.team';

export function readRememberedTeam(): string | null {
  try {
    return window.localStorage.getItem(storageKey);
  } catch {
    return null;
  }
}

export function rememberTeam(teamId: string) {
  try {
    window.localStorage.setItem(storageKey, teamId);
  } catch {
    // Not remembered when storage is unavailable; the address still names the team.
  }
}
