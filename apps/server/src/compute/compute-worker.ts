import type { MessagePort } from 'node:worker_threads';
import type { Design } from '@barwright/contracts';
import { exportDesign, type ExportedFile, type ExportFormat } from '@barwright/engine';
import { entryThumbnailSvg } from '../publishing/entry-thumbnail';

/** A job for a compute worker: the design is already validated against the contracts. */
export type ComputeTask =
  | { kind: 'export'; design: Design; format: ExportFormat; name: string; title?: string }
  | { kind: 'thumbnail'; design: Design };

export type ComputeResult = ExportedFile | string;

/** Runs in a worker thread (piscina). Says on `started` when it begins, so the time budget counts running time only. */
export default async function runComputeTask({ task, started }: { task: ComputeTask; started: MessagePort }): Promise<ComputeResult> {
  started.postMessage('started');
  started.close();
  if (task.kind === 'thumbnail') return entryThumbnailSvg(task.design);
  return exportDesign(task.design, task.format, { name: task.name, title: task.title });
}
