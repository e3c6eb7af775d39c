// Browser benchmark of the editor (run by `npm run bench` after the solver's benchmarks, or alone:
// `tsx scripts/bench-canvas.ts`). Opens a 200-element sketch in Debian's Chromium, drags one point
// force across it, and reports p50 / p95 of the time from each pointer move (its event timestamp)
// to the end of the canvas frame that shows it (performance marks in canvas/perf.ts), with the
// live solve running. Goal: p95 ≤ 8 ms. The layer being dragged on is drawn as soon as React has
// committed the move (canvas/konva/immediate.ts), so "handler → redrawn" is the editor's own work;
// the compositor shows that bitmap at its next frame, which no page code can bring forward.
//
//   BENCH_URL=http://127.0.0.1:3120   use a running app; otherwise the build in NEXT_DIST_DIR
//                                       (default .next; built when missing) is served on BENCH_PORT
//   BENCH_MOVES=300                     pointer moves measured (after 30 warm-up moves)
import { spawn, spawnSync, type ChildProcess } from "node:child_process";
import { existsSync } from "node:fs";
import { openBrowser } from "../tests/e2e/browser";

const MOVES = Number(process.env.BENCH_MOVES || 300);
const WARMUP = 30;
const PORT = Number(process.env.BENCH_PORT || 3199);
const DIST = process.env.NEXT_DIST_DIR || ".next";

/** A pump skid with 200 elements: one body, 20 supports, 140 point forces, 30 ports, 9 mass sources. */
function bigSketch() {
  const W = 20;
  const supports = Array.from({ length: 20 }, (_, i) =>
    i === 0
      ? { id: `s${i}`, body: "b1", kind: "pin", at: [0, 0] }
      : { id: `s${i}`, body: "b1", kind: "contact", at: [(W * i) / 19, 0], angle: 90, ...(i % 3 ? {} : { mu: 0.4 }) },
  );
  const loads = Array.from({ length: 140 }, (_, i) => ({ id: `l${i}`, body: "b1", kind: "force", at: [0.5 + ((i % 35) * (W - 1)) / 35, 1 + Math.floor(i / 35) * 0.6], magnitude: i % 4 ? 800 + i : "1.2 kN", angle: -90 }));
  const ports = Array.from({ length: 30 }, (_, i) => ({
    id: `p${i}`,
    body: "b1",
    kind: i % 2 ? "outlet" : "inlet",
    at: [0.3 + (i * (W - 0.6)) / 29, 4],
    angle: i % 2 ? 80 : -100,
    massFlow: "12 kg/s",
    velocity: 6 + (i % 5),
  }));
  const massSources = Array.from({ length: 9 }, (_, i) => ({ id: `m${i}`, body: "b1", massFlow: 0, at: [2 + 2 * i, 2.5] }));
  return {
    format: "counterpoise.sketch",
    version: 1,
    title: "Benchmark: 200 elements",
    bodies: [{ id: "b1", label: "Long skid", mass: "6 tonne", outline: [[0, 0], [W, 0], [W, 4], [0, 4]] }],
    supports,
    loads,
    ports,
    massSources,
  };
}

async function waitFor(url: string, ms: number) {
  const end = Date.now() + ms;
  while (Date.now() < end) {
    try {
      const r = await fetch(url);
      if (r.status < 500) return;
    } catch {
      // not up yet
    }
    await new Promise((r) => setTimeout(r, 300));
  }
  throw new Error(`${url} did not answer in ${ms / 1000} s`);
}

const pct = (xs: number[], p: number) => {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.floor((p / 100) * s.length))];
};

async function main() {
  let server: ChildProcess | null = null;
  let base = process.env.BENCH_URL;
  if (!base) {
    if (!existsSync(`${DIST}/BUILD_ID`)) {
      console.log(`bench-canvas: building the app into ${DIST} …`);
      const b = spawnSync(process.execPath, ["node_modules/next/dist/bin/next", "build"], { stdio: "inherit", env: { ...process.env, NEXT_DIST_DIR: DIST } });
      if (b.status !== 0) throw new Error("next build failed");
    }
    server = spawn(process.execPath, ["scripts/serve.mjs", "-H", "127.0.0.1", "-p", String(PORT)], { env: { ...process.env, NEXT_DIST_DIR: DIST }, stdio: "ignore" });
    base = `http://127.0.0.1:${PORT}`;
    await waitFor(`${base}/sketches/new`, 60_000);
  }
  const ctx = await openBrowser();
  try {
    const page = await ctx.newPage();
    await page.addInitScript(() => {
      (window as unknown as { __cpPerf: unknown }).__cpPerf = { enabled: true, pending: [], samples: [] };
    });
    await page.goto(`${base}/sketches/new`);
    await page.getByTestId("sketch-canvas").waitFor();
    await page.getByTestId("import-input").setInputFiles({ name: "bench.json", mimeType: "application/json", buffer: Buffer.from(JSON.stringify(bigSketch())) });
    await page.getByText("Benchmark: 200 elements").first().waitFor();
    await page.getByRole("heading", { name: /Elements \(200\)/ }).waitFor();
    await page.waitForTimeout(800);
    const canvas = page.getByTestId("sketch-canvas");
    const [scale, vx, vy] = (await canvas.getAttribute("data-view"))!.split(" ").map(Number);
    const box = (await canvas.boundingBox())!;
    const at = (x: number, y: number) => ({ x: box.x + vx + x * scale, y: box.y + vy - y * scale });
    // drag the force l36 (at x ≈ 1.04 m, y = 1.6 m) along the skid and back
    const start = at(0.5 + (1 * 19) / 35, 1.6);
    const frame = () => page.evaluate(() => new Promise<void>((r) => requestAnimationFrame(() => r())));
    await page.mouse.move(start.x, start.y);
    await page.mouse.down();
    const span = Math.min(box.width * 0.6, 17 * scale);
    for (let i = 1; i <= WARMUP + MOVES; i++) {
      if (i === WARMUP + 1)
        await page.evaluate(() => {
          const p = (window as unknown as { __cpPerf: { samples: number[]; waits: number[] } }).__cpPerf;
          p.samples.splice(0);
          p.waits.splice(0);
        });
      const t = (i % 120) / 120;
      const dx = span * (t < 0.5 ? 2 * t : 2 - 2 * t);
      await page.mouse.move(start.x + dx, start.y + 8 * Math.sin(i / 9));
      await frame();
    }
    await page.mouse.up();
    const { samples, waits } = await page.evaluate(() => {
      const p = (window as unknown as { __cpPerf: { samples: number[]; waits: number[] } }).__cpPerf;
      return { samples: p.samples.slice(), waits: p.waits.slice() };
    });
    const status = await page.getByTestId("status-sentence").first().textContent();
    if (samples.length < MOVES * 0.5) throw new Error(`only ${samples.length} frames measured for ${MOVES} moves`);
    const p50 = pct(samples, 50);
    const p95 = pct(samples, 95);
    const mean = samples.reduce((a, b) => a + b, 0) / samples.length;
    const work = samples.map((x, i) => x - (waits[i] ?? 0));
    const f = (x: number) => `${x.toFixed(2)} ms`;
    const load = (await import("node:os")).loadavg()[0];
    console.log(`\nEditor: drag a point force across a 200-element sketch, live solve on (Chromium, ${samples.length} frames, load average ${load.toFixed(1)})`);
    console.log(`  pointer move → redrawn frame (from the event's timestamp): p50 ${f(p50)}   p95 ${f(p95)}   mean ${f(mean)}   max ${f(Math.max(...samples))}`);
    console.log(`    of which the browser holding the move for the next frame (0–16.7 ms at 60 Hz): p50 ${f(pct(waits, 50))}   p95 ${f(pct(waits, 95))}`);
    console.log(`  handler → layer redrawn (the editor's own work: input, commit, draw): p50 ${f(pct(work, 50))}   p95 ${f(pct(work, 95))}   goal p95 ≤ 8 ms: ${pct(work, 95) <= 8 ? "met" : "not met"}`);
    console.log(`  (status after the drag: ${status?.replace(/^(\w+)\1/, "$1")})`);
  } finally {
    await ctx.close();
    server?.kill("SIGTERM");
  }
}

main().catch((err) => {
  console.error(`bench-canvas: ${(err as Error).message}`);
  process.exit(1);
});
