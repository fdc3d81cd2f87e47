import * as Y from 'yjs';
import { setDesignField } from '@barwright/contracts/design-doc';

type Peer = { doc: Y.Doc };

/** The n-th percentile of `xs` (nearest rank). */
export const percentile = (xs: number[], p: number) => [...xs].sort((a, b) => a - b)[Math.min(xs.length - 1, Math.floor((p / 100) * xs.length))];

/**
 * Milliseconds from the writer changing the first layer's lobe count to the watcher seeing the new
 * value (edit `i` of a run picks a value the watcher does not have yet).
 */
export async function timeLobeEdit(writer: Peer, watcher: Peer, i: number): Promise<number> {
  const lobes = () => (watcher.doc.getMap('design').get('rosette') as Y.Map<any>).get('layers').get(0).get('lobes');
  const target = 2 + (i % 300) === lobes() ? 3 + (i % 300) : 2 + (i % 300);
  const arrived = new Promise<number>((resolve) => {
    const onUpdate = () => {
      if (lobes() !== target) return;
      watcher.doc.off('update', onUpdate);
      resolve(performance.now());
    };
    watcher.doc.on('update', onUpdate);
  });
  const started = performance.now();
  setDesignField(writer.doc, ['rosette', 'layers', 0, 'lobes'], target);
  return (await arrived) - started;
}
