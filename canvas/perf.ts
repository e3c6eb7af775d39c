// Drag latency probe for the Chromium benchmark: the time from a pointer move (its event
// timestamp) to the end of the canvas frame that shows it, as performance measures.
interface Probe {
  enabled: boolean;
  pending: number[];
  samples: number[];
}

declare global {
  interface Window {
    __cpPerf?: Probe;
  }
}

const local: Probe = { enabled: false, pending: [], samples: [] };

function probe(): Probe {
  if (typeof window === "undefined") return local;
  return (window.__cpPerf ??= local);
}

export function markInput(timeStamp: number): void {
  const p = probe();
  if (!p.enabled) return;
  p.pending.push(timeStamp);
  performance.mark("cp:pointer-move", { startTime: timeStamp });
}

/** Called after a layer has drawn: every pending input is now on screen. */
export function markFrame(): void {
  const p = probe();
  if (!p.enabled || !p.pending.length) return;
  const end = performance.now();
  for (const t of p.pending) {
    p.samples.push(end - t);
    performance.measure("cp:move-to-frame", { start: t, end });
  }
  p.pending.length = 0;
}
