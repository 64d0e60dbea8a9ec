/**
 * Chart redraws run one per task, so several charts redrawing after a chunk never add up to one
 * long main-thread task. A MessageChannel hop is faster than setTimeout's clamped delay.
 */
const queue: (() => void)[] = [];
let pending = false;
let channel: MessageChannel | null = null;

function pump() {
  const job = queue.shift();
  if (job) job();
  if (queue.length > 0) channel!.port2.postMessage(null);
  else pending = false;
}

export function enqueueDraw(job: () => void): void {
  queue.push(job);
  if (pending) return;
  pending = true;
  if (!channel) {
    channel = new MessageChannel();
    channel.port1.onmessage = pump;
  }
  channel.port2.postMessage(null);
}
