import { DOCUMENT } from '@angular/common';
import { inject, Injectable } from '@angular/core';
import type { Design } from '@barwright/contracts';
import { writeDesign } from '@barwright/contracts/design-doc';
import { WebsocketProvider } from 'y-websocket';
import * as Y from 'yjs';

/** How long to wait for the design's document to arrive, or for the write to leave the browser (ms). */
const TIMEOUT_MS = 8000;

/**
 * Writes a whole design file into a board design through its live document (the same Yjs
 * connection the studio uses, at /collab/<designId>). There is no REST route that takes a design
 * file, so this is how an imported rosette reaches a new design; the server stores the update as
 * it arrives and checks the board role before it accepts any write.
 */
@Injectable({ providedIn: 'root' })
export class DesignFileWriter {
  private readonly document = inject(DOCUMENT);

  async write(designId: string, design: Design): Promise<void> {
    const location = this.document.location;
    const url = `${location.protocol === 'https:' ? 'wss' : 'ws'}://${location.host}/collab`;
    const doc = new Y.Doc();
    const provider = new WebsocketProvider(url, designId, doc, { disableBc: true });
    try {
      await synced(provider);
      writeDesign(doc, design, 'measured-import');
      await sent(provider);
    } finally {
      provider.destroy();
      doc.destroy();
    }
  }
}

function synced(provider: WebsocketProvider): Promise<void> {
  return new Promise((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error('The design did not open in time. Try again.')), TIMEOUT_MS);
    provider.once('sync', (isSynced: boolean) => {
      clearTimeout(timer);
      if (isSynced) resolve();
      else reject(new Error('The design did not open. Try again.'));
    });
  });
}

/** Resolves once the socket has handed every queued byte to the network. */
function sent(provider: WebsocketProvider): Promise<void> {
  const started = Date.now();
  return new Promise((resolve, reject) => {
    const check = () => {
      const socket = provider.ws;
      if (socket && socket.readyState === socket.OPEN && socket.bufferedAmount === 0) return resolve();
      if (Date.now() - started > TIMEOUT_MS) return reject(new Error('The rosette could not be sent. Try again.'));
      setTimeout(check, 50);
    };
    check();
  });
}
