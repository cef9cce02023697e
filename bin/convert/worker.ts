/**
 * The worker thread's task for piscina: take files from the shared queue
 * until it is empty, sending each result back as soon as it is known (for
 * the progress bar), and answer with how many were sent.
 */
import type { MessagePort } from 'node:worker_threads';
import { drainQueue, type ClaimQueue } from './claim-queue.js';

export interface WorkerJob extends ClaimQueue {
  port: MessagePort;
}

export default async function convertFromQueue({ port, ...queue }: WorkerJob): Promise<number> {
  const count = await drainQueue(queue, (index, result) => port.postMessage([index, result]));
  port.close();
  return count;
}
