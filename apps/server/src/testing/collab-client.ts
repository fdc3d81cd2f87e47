import WebSocket from 'ws';
import * as Y from 'yjs';
import { WebsocketProvider } from 'y-websocket';

/** A y-websocket client in Node, sending the session cookie at the upgrade as a browser would. */
export function collabClient(baseUrl: string, designId: string, cookie: string, options: { connect?: boolean } = {}) {
  class CookieWebSocket extends WebSocket {
    constructor(url: string, protocols?: string | string[]) {
      super(url, protocols, { headers: { cookie } });
    }
  }
  const doc = new Y.Doc();
  const provider = new WebsocketProvider(baseUrl.replace(/^http/, 'ws') + '/collab', designId, doc, {
    WebSocketPolyfill: CookieWebSocket as never,
    disableBc: true, // several clients in one process would otherwise sync through BroadcastChannel, bypassing the server
    connect: options.connect ?? true,
    maxBackoffTime: 200,
  });
  const synced = () =>
    new Promise<void>((resolve) => {
      if (provider.synced) return resolve();
      provider.once('sync', (isSynced: boolean) => isSynced && resolve());
    });
  const closed = () => new Promise<{ code: number; reason: string }>((resolve) => provider.on('connection-close', (e: CloseEvent | null) => e && resolve({ code: e.code, reason: e.reason })));
  return { doc, provider, synced, closed, destroy: () => provider.destroy() };
}

/** Waits until `check` holds, polling; fails after `ms`. */
export async function eventually(check: () => boolean, ms = 5000, what = 'condition'): Promise<void> {
  const start = Date.now();
  while (!check()) {
    if (Date.now() - start > ms) throw new Error(`timed out waiting for ${what}`);
    await new Promise((r) => setTimeout(r, 20));
  }
}
