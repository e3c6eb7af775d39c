// Drag latency probe for the Chromium benchmark: the time from a pointer move (its event
// timestamp) to the end of the canvas frame that shows it, as performance measures. It also
// splits each sample into the wait before the handler ran and the work from there to the frame.
interface Probe {
  enabled: boolean;
  pending: Array<{ t: number; h: number }>;
  samples: number[];
  waits: number[];
}

declare global {
  interface Window {
    __cpPerf?: Probe;
  }
}

const local: Probe = { enabled: false, pending: [], samples: [], waits: [] };

function probe(): Probe {
  if (typeof window === "undefined") return local;
  const p = (window.__cpPerf ??= local);
  p.waits ??= [];
  return p;
}

export function markInput(timeStamp: number): void {
  const p = probe();
  if (!p.enabled) return;
  p.pending.push({ t: timeStamp, h: performance.now() });
  performance.mark("cp:pointer-move", { startTime: timeStamp });
}

/** Called after a layer has drawn: every pending input is now on screen. */
export function markFrame(): void {
  const p = probe();
  if (!p.enabled || !p.pending.length) return;
  const end = performance.now();
  for (const { t, h } of p.pending) {
    p.samples.push(end - t);
    p.waits.push(h - t);
    performance.measure("cp:move-to-frame", { start: t, end });
  }
  p.pending.length = 0;
}
