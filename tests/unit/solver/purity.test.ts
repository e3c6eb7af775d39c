// The solver is pure TypeScript that runs in the browser, route handlers and the command line:
// no React, Konva, Next or database imports. Expressions are evaluated once, when a sketch is
// parsed: `solve` works on plain numbers, and nothing it imports reaches mathjs.
import { existsSync, readFileSync, readdirSync } from "node:fs";
import { dirname, join, resolve } from "node:path";
import { describe, expect, it } from "vitest";

const SOLVER = resolve(__dirname, "../../../solver");
const files = [
  ...readdirSync(SOLVER).filter((f) => f.endsWith(".ts")).map((f) => join(SOLVER, f)),
  ...readdirSync(join(SOLVER, "migrations")).filter((f) => f.endsWith(".ts")).map((f) => join(SOLVER, "migrations", f)),
];

/** The modules a file imports for their values (`import type` erases at build and is left out). */
function valueImports(file: string): string[] {
  const src = readFileSync(file, "utf8");
  const out: string[] = [];
  for (const m of src.matchAll(/^(import|export)\s+([^;]*?)\s+from\s+"([^"]+)"/gms)) {
    if (/^type\b/.test(m[2])) continue;
    out.push(m[3]);
  }
  for (const m of src.matchAll(/\bimport\(\s*"([^"]+)"\s*\)/g)) out.push(m[1]);
  return out;
}

/** Every solver file `entry` reaches through value imports. */
function closure(entry: string): string[] {
  const seen = new Set<string>();
  const stack = [entry];
  while (stack.length) {
    const f = stack.pop()!;
    if (seen.has(f)) continue;
    seen.add(f);
    for (const spec of valueImports(f)) {
      if (!spec.startsWith(".")) continue;
      const base = resolve(dirname(f), spec);
      stack.push(existsSync(`${base}.ts`) ? `${base}.ts` : join(base, "index.ts"));
    }
  }
  return [...seen];
}

describe("the solver's imports", () => {
  it("are other solver files, mathjs and zod only (node:fs in the command line alone)", () => {
    expect(files.length).toBeGreaterThan(20);
    const outside = files.flatMap((f) =>
      valueImports(f)
        .filter((spec) => !spec.startsWith(".") && spec !== "mathjs" && spec !== "zod" && !(f.endsWith("cli.ts") && spec.startsWith("node:")))
        .map((spec) => `${f.slice(SOLVER.length + 1)} imports ${spec}`),
    );
    expect(outside).toEqual([]);
  });

  it("solve reaches no file that imports mathjs: expressions are numbers by the time it runs", () => {
    const reached = closure(join(SOLVER, "solve.ts"));
    expect(reached.map((f) => f.slice(SOLVER.length + 1))).toContain("model.ts");
    const withMathjs = reached.filter((f) => valueImports(f).includes("mathjs")).map((f) => f.slice(SOLVER.length + 1));
    expect(withMathjs).toEqual([]);
  });

  it("parsing does reach mathjs (the check above can fail)", () => {
    const reached = closure(join(SOLVER, "parse.ts"));
    expect(reached.some((f) => valueImports(f).includes("mathjs"))).toBe(true);
  });
});
