/** Small per-device settings (units, chosen club) kept in localStorage on the web; memory elsewhere. */
const memory = new Map<string, string>();

export function readSetting(key: string): string | null {
  try {
    if (typeof localStorage !== 'undefined') return localStorage.getItem(key);
  } catch {
    // Private browsing may refuse storage; fall through to memory.
  }
  return memory.get(key) ?? null;
}

export function writeSetting(key: string, value: string): void {
  memory.set(key, value);
  try {
    if (typeof localStorage !== 'undefined') localStorage.setItem(key, value);
  } catch {
    // Memory copy above still applies for this session.
  }
}
