import type { ComponentType, ReactNode } from 'react';

/*
 * Mount points for the sync client (H5a): the header indicator from components/sync/sync-indicator.tsx
 * and <SyncProvider> from hooks/sync/. They are found with Metro's require.context, so the shell builds
 * and runs before that code lands and picks it up, unchanged, once it does.
 */

declare const require: { context: (dir: string, recursive: boolean, filter: RegExp) => { keys(): string[]; (key: string): Record<string, unknown> } };

function findExport<T>(ctx: ReturnType<typeof require.context>, names: string[]): T | null {
  for (const key of ctx.keys()) {
    const mod = ctx(key);
    for (const n of names) if (typeof mod[n] === 'function') return mod[n] as T;
  }
  return null;
}

const indicatorCtx = require.context('../', true, /^\.\/sync\/sync-indicator\.tsx$/);
const providerCtx = require.context('../../hooks', true, /^\.\/sync\/index\.tsx?$/);

const SyncIndicator = findExport<ComponentType<object>>(indicatorCtx, ['SyncIndicator', 'default']);
const SyncProvider = findExport<ComponentType<{ clubId: string; children: ReactNode }>>(providerCtx, ['SyncProvider']);

export const HAS_SYNC_INDICATOR = SyncIndicator !== null;

export function SyncIndicatorSlot() {
  return SyncIndicator ? <SyncIndicator /> : null;
}

export function SyncProviderSlot({ clubId, children }: { clubId: string | null; children: ReactNode }) {
  if (!SyncProvider || !clubId) return <>{children}</>;
  return (
    <SyncProvider key={clubId} clubId={clubId}>
      {children}
    </SyncProvider>
  );
}
