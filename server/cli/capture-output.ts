// Test helper for the command tests: what a command prints, line by line, instead of on the terminal.
// (Restore with vi.restoreAllMocks() after each test.)
import { vi } from 'vitest';

export function captureOutput(): { out: string[]; err: string[] } {
  const out: string[] = [];
  const err: string[] = [];
  vi.spyOn(console, 'log').mockImplementation((...a: unknown[]) => void out.push(a.join(' ')));
  vi.spyOn(console, 'error').mockImplementation((...a: unknown[]) => void err.push(a.join(' ')));
  return { out, err };
}
