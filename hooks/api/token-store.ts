import { tokensSchema, type Tokens } from '@/shared/schemas';

/*
 * Where the signed-in person's tokens live: localStorage on the web (so a reload keeps you signed in),
 * memory elsewhere. Anything read back is parsed: a hand-edited or stale value signs you out, never crashes.
 */

const KEY = 'loftline.session';
type Listener = () => void;

let current: Tokens | null = null;
let loaded = false;
const listeners = new Set<Listener>();

function storage(): Storage | null {
  try {
    return typeof localStorage === 'undefined' ? null : localStorage;
  } catch {
    return null;
  }
}

function load(): void {
  if (loaded) return;
  loaded = true;
  const raw = storage()?.getItem(KEY);
  if (!raw) return;
  try {
    const parsed = tokensSchema.safeParse(JSON.parse(raw));
    current = parsed.success ? parsed.data : null;
  } catch {
    current = null;
  }
}

export const tokenStore = {
  get(): Tokens | null {
    load();
    return current;
  },
  set(tokens: Tokens | null): void {
    loaded = true;
    current = tokens;
    const s = storage();
    if (tokens) s?.setItem(KEY, JSON.stringify(tokens));
    else s?.removeItem(KEY);
    for (const l of listeners) l();
  },
  subscribe(listener: Listener): () => void {
    listeners.add(listener);
    return () => listeners.delete(listener);
  },
};
