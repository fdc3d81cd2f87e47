import * as Y from 'yjs';
import { docs } from '@y/websocket-server/utils';
import type { DesignDocStore } from './design-doc-store';

/**
 * The documents y-websocket holds open, by design id (the library keeps them in one module-level map).
 * A document enters the map empty and fills when the gateway's bindState has loaded it; the gateway
 * sets its `whenInitialized` to that load, so readers here wait for it and never see it half-loaded.
 */
const liveDoc = (designId: string) => docs.get(designId);

/** The current document: the live one (once loaded) when someone has it open, else a copy loaded from storage. */
export async function currentDoc(store: DesignDocStore, designId: string): Promise<Y.Doc> {
  const live = liveDoc(designId);
  if (!live) return store.loadDoc(designId);
  await live.whenInitialized;
  return live;
}

/** Applies a change made on the server (a restored version) as a new edit: stored first, then relayed to everyone. */
export async function applyServerUpdate(store: DesignDocStore, designId: string, update: Uint8Array): Promise<void> {
  await store.append(designId, update);
  const live = liveDoc(designId);
  if (live) Y.applyUpdate(live, update, 'server');
}
