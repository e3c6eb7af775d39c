// npm run bench: solver speed (median µs per solve for 10, 100 and 1000 elements; a 1000-point
// sweep of a 20-element sketch, and one on a combination) and the gzip size mathjs adds to the client bundle.
// Then the browser benchmarks: the editor's drag (scripts/bench-canvas.ts) and the studies' sweep
// plot (scripts/bench-studies.ts). `--solver-only` skips them.
import { buildSync } from "esbuild";
import { spawnSync } from "node:child_process";
import { loadavg } from "node:os";
import { gzipSync } from "node:zlib";
import { linspace, parseSketch, solve, solveSweep, type SketchFileInput } from "../solver";
import { sweeperOn } from "../solver/studySweep";
import { sweepWith } from "../solver/sweep";
import { exampleById } from "../canvas/examples";

/** A skid-like body with `n` elements: supports, forces, couples and port pairs. */
export function benchSketch(n: number): SketchFileInput {
  const supports: SketchFileInput["supports"] = [];
  const loads: SketchFileInput["loads"] = [];
  const ports: SketchFileInput["ports"] = [];
  let id = 0;
  const w = 10;
  for (let i = 0; id < n - 1; i++) {
    const x = ((i * 7919) % 1000) / 100;
    const kind = i % 5;
    if (kind === 0) supports!.push({ id: `s${id++}`, body: "b", kind: "contact", at: [x, 0], angle: 90, mu: 0.5 });
    else if (kind === 1) loads!.push({ id: `f${id++}`, body: "b", kind: "force", at: [x, 1], magnitude: 100 + i, angle: -90 });
    else if (kind === 2) loads!.push({ id: `c${id++}`, body: "b", kind: "couple", value: 10 });
    else if (kind === 3) {
      ports!.push({ id: `p${id++}`, body: "b", kind: "inlet", at: [0, 0.5 + (x % 1)], angle: 0, massFlow: 2, velocity: 3, pressure: 1000, area: 0.01 });
    } else ports!.push({ id: `p${id++}`, body: "b", kind: "outlet", at: [w, 0.5 + (x % 1)], angle: 20, massFlow: 2, velocity: 8 });
  }
  supports!.push({ id: "anchor", body: "b", kind: "pin", at: [5, 0] });
  return {
    format: "counterpoise.sketch",
    version: 1 as unknown as SketchFileInput["version"],
    parameters: { theta: "20 deg" },
    bodies: [{ id: "b", outline: [[0, 0], [w, 0], [w, 2], [0, 2]], mass: 5000 }],
    supports,
    loads,
    ports: ports!.map((p, i) => (i === 0 ? { ...p, angle: "theta" } : p)),
    massSources: [],
  };
}

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)];
}

/** median and best of the samples: on a shared machine the best shows the code, the median the load */
const both = (xs: number[], digits: number) => `${median(xs).toFixed(digits)} (best ${Math.min(...xs).toFixed(digits)})`;

function benchSolve(n: number): string {
  const p = parseSketch(benchSketch(n));
  if (!p.ok) throw new Error(JSON.stringify(p.errors));
  const sk = p.sketch;
  for (let i = 0; i < 200; i++) solve(sk); // warm up
  const batch = n >= 1000 ? 5 : n >= 100 ? 50 : 200;
  const samples: number[] = [];
  for (let r = 0; r < 60; r++) {
    const t0 = performance.now();
    for (let i = 0; i < batch; i++) solve(sk);
    samples.push(((performance.now() - t0) * 1000) / batch);
  }
  return both(samples, 1);
}

function benchSweep(): string {
  const p = parseSketch(benchSketch(20));
  if (!p.ok) throw new Error(JSON.stringify(p.errors));
  const values = linspace(0, 90, 1000);
  solveSweep(p.sketch, "theta", values);
  const samples: number[] = [];
  for (let r = 0; r < 25; r++) {
    const t0 = performance.now();
    solveSweep(p.sketch, "theta", values);
    samples.push(performance.now() - t0);
  }
  return both(samples, 1);
}

/** A 1000-point sweep of the exhaust-stack demo's wind speed on its factored uplift combination:
 *  each point builds its two cases' load sets and solves their sum once. */
function benchCombinationSweep(): string {
  const p = parseSketch(exampleById("exhaust-stack")!.sketch);
  if (!p.ok) throw new Error(JSON.stringify(p.errors));
  const values = linspace(20, 45, 1000);
  const run = () => sweepWith(sweeperOn(p.file, { combination: "uplift" }, "v"), values);
  run();
  const samples: number[] = [];
  for (let r = 0; r < 15; r++) {
    const t0 = performance.now();
    run();
    samples.push(performance.now() - t0);
  }
  return both(samples, 1);
}

function gzipBytes(entry: string): number {
  const out = buildSync({ entryPoints: [entry], bundle: true, minify: true, format: "esm", write: false, platform: "browser", logLevel: "silent" });
  return gzipSync(out.outputFiles[0].contents).length;
}

function main() {
  const results: Record<string, string> = {};
  for (const n of [10, 100, 1000]) results[`solve, ${n} elements (µs, median and best)`] = benchSolve(n);
  results["solveSweep, 1000 points of a 20-element sketch (ms)"] = benchSweep();
  results["sweep of a combination, 1000 points of the exhaust stack (ms)"] = benchCombinationSweep();
  results["mathjs parts used, minified + gzip (kB)"] = (gzipBytes("solver/expressions.ts") / 1024).toFixed(1);
  results["whole solver incl. mathjs and zod, minified + gzip (kB)"] = (gzipBytes("solver/index.ts") / 1024).toFixed(1);
  const load = loadavg()[0];
  console.log(`\nSolver benchmarks (this machine, load average ${load.toFixed(1)}):`);
  for (const [k, v] of Object.entries(results)) console.log(`  ${k.padEnd(62)} ${v}`);

  if (!process.argv.includes("--solver-only")) {
    // the browser benchmarks: the editor's drag, then the studies' sweep
    for (const script of ["scripts/bench-canvas.ts", "scripts/bench-studies.ts"]) {
      const r = spawnSync(process.execPath, ["node_modules/.bin/tsx", script], { stdio: "inherit" });
      if (r.status !== 0) process.exitCode = r.status ?? 1;
    }
  }
}

if (process.argv[1]?.endsWith("bench.ts")) main();
