import type { PullRequest, PullResponse, PushRequest, PushResponse } from './messages';

/** How the engine reaches the server. sync/transport/fetch-transport.ts is the real one; tests inject faulty ones. */
export interface SyncTransport {
  push(request: PushRequest): Promise<PushResponse>;
  pull(request: PullRequest): Promise<PullResponse>;
}

export type TransportErrorKind = 'offline' | 'unauthorized' | 'forbidden' | 'server' | 'bad-request' | 'bad-response';

/** A request that did not produce an answer the engine can use. Whether the server committed is unknown. */
export class TransportError extends Error {
  constructor(
    readonly kind: TransportErrorKind,
    message: string,
    readonly status?: number,
  ) {
    super(message);
    this.name = 'TransportError';
  }
}
