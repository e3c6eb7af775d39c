// Browser benchmark of the studies (run by `npm run bench`, or alone: `tsx scripts/bench-studies.ts`):
// a 1000-point sweep of the monitor-trailer demo, timed in Chromium from the click on "Run the
// sweep" until the plot is on screen (a MutationObserver sees the curves drawn). Goal: ≤ 0.5 s.
//
//   BENCH_URL=http://127.0.0.1:3120   use a running app; otherwise the build in NEXT_DIST_DIR
//                                       (default .next) is served on BENCH_PORT (3198)
import { spawn, type ChildProcess } from "node:child_process";
import { existsSync } from "node:fs";
import { openBrowser } from "../tests/e2e/browser";

const PORT = Number(process.env.BENCH_PORT || 3198);
const DIST = process.env.NEXT_DIST_DIR || ".next";
const RUNS = Number(process.env.BENCH_RUNS || 7);

async function up(url: string) {
  for (let i = 0; i < 200; i++) {
    try {
      if ((await fetch(url)).status < 500) return;
    } catch {
      // not yet
    }
    await new Promise((r) => setTimeout(r, 300));
  }
  throw new Error(`${url} did not answer`);
}

async function main() {
  let server: ChildProcess | null = null;
  let base = process.env.BENCH_URL;
  if (!base) {
    if (!existsSync(`${DIST}/BUILD_ID`)) throw new Error(`no build in ${DIST}: run npm start (or next build) first, or set BENCH_URL`);
    server = spawn(process.execPath, ["scripts/serve.mjs", "-H", "127.0.0.1", "-p", String(PORT)], { env: { ...process.env, NEXT_DIST_DIR: DIST }, stdio: "ignore" });
    base = `http://127.0.0.1:${PORT}`;
    await up(`${base}/sketches/new`);
  }
  const ctx = await openBrowser();
  try {
    const page = await ctx.newPage();
    await page.goto(`${base}/sketches/new?example=fire-monitor-trailer`);
    await page.getByRole("tab", { name: "Sweep" }).click();
    await page.getByRole("combobox", { name: "Parameter to sweep" }).selectOption("theta");
    await page.getByRole("textbox", { name: "From" }).fill("0");
    await page.getByRole("textbox", { name: "To" }).fill("80");
    await page.getByRole("textbox", { name: "Points" }).fill("1000");
    const times: number[] = [];
    for (let i = 0; i < RUNS; i++) {
      const ms = await page.evaluate(
        () =>
          new Promise<number>((resolve) => {
            const panel = document.querySelector("[data-testid=sweep-panel]")!;
            const before = panel.querySelector("[data-testid=sweep-chart]")?.getAttribute("data-run") ?? "";
            const t0 = performance.now();
            const obs = new MutationObserver(() => {
              const chart = panel.querySelector("[data-testid=sweep-chart]");
              if (chart && chart.getAttribute("data-run") !== before && chart.querySelector("path.recharts-curve")) {
                obs.disconnect();
                // the frame that shows it
                requestAnimationFrame(() => resolve(performance.now() - t0));
              }
            });
            obs.observe(panel, { childList: true, subtree: true, attributes: true, attributeFilter: ["data-run", "d"] });
            (panel.querySelector("button[type=submit]") as HTMLButtonElement).click();
          }),
      );
      times.push(ms);
      await page.waitForTimeout(200);
    }
    times.sort((a, b) => a - b);
    const med = times[Math.floor(times.length / 2)];
    const load = (await import("node:os")).loadavg()[0];
    console.log(`\nStudies: a 1000-point sweep of the monitor trailer, click → plot on screen (Chromium, ${RUNS} runs, load average ${load.toFixed(1)})`);
    console.log(`  median ${med.toFixed(0)} ms   fastest ${times[0].toFixed(0)} ms   slowest ${times[times.length - 1].toFixed(0)} ms   goal ≤ 500 ms: ${med <= 500 ? "met" : "not met"}`);
  } finally {
    await ctx.close();
    server?.kill("SIGTERM");
  }
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
