// npm run solve -- FILE   prints the solve result JSON on stdout; invalid input exits 1 with
// { ok: false, errors } on stdout. Nothing else is written to stdout by this program, and the
// project's .npmrc (loglevel=silent) keeps npm's own "> counterpoise@… solve" banner off it too.
//
// Two more questions, for scripts and batch checks (the default output stays the contract's):
//   --cases FILE      every operating case and combination: the runs, the envelope, the runs left
//                     out of it, the required factors of safety
//   --limit NAME=FROM..TO --quantity SUPPORT.COMPONENT [--target VALUE] [--case ID |
//           --combination ID | --every-case] FILE
//                     where the quantity reaches the target (0 unless given; a plain number is SI,
//                     N or N·m, or give a unit: "450 lbf") as NAME (a parameter or flowFactor) runs
//                     from FROM to TO (in NAME's own unit)
//   --limit NAME=FROM..TO --quantity BODY.tips | BODY.slides [--case ID | --combination ID |
//           --every-case] FILE
//                     where the body itself starts to tip (no set of its contacts and ties holds it)
//                     or to slide as a whole (Σμ·n − |Σt| of its bearing friction contacts reaches
//                     zero): the limit itself, so no --target; for sliding, "tipsFrom" says where
//                     the body tips in the range (sliding is read only while it is held); for
//                     tipping, "slidesFrom" says where it already slides as a whole (friction is
//                     checked, not enforced: a tipping value past it holds only while the body is
//                     held against sliding)
//                     A support's quantity that does not reach the target in a run gets "hint":
//                     where it came closest and which way it goes past each end, in the words of
//                     the Sweep tab's "In every case" (values in N, N·m), and "wider", a range a
//                     further search may find it in
import { readFileSync } from "node:fs";
import { elementNames, solveCases } from "./cases";
import { evaluateToNumber } from "./expressions";
import { parseSketch, solveFile } from "./index";
import { runNoLimitWords } from "./limitHint";
import type { QuantityComponent } from "./quantity";
import { formatNumber } from "./units";
import { bodyLimits, findAnyLimitWith, firstReached, limitEverywhere, sweeperOn, type LimitEverywhere, type LimitQuantity } from "./studySweep";
import type { FieldError } from "./types";

const USAGE =
  "usage: npm run solve -- FILE | --cases FILE | --limit NAME=FROM..TO --quantity SUPPORT.COMPONENT [--target VALUE] [--case ID | --combination ID | --every-case] FILE | --limit NAME=FROM..TO --quantity BODY.tips|BODY.slides [--case ID | --combination ID | --every-case] FILE (FILE is a sketch file, or - for standard input)";
const COMPONENTS: readonly QuantityComponent[] = ["fx", "fy", "m", "n", "t", "resultant", "margin", "frictionRatio", "frictionMargin"];
/** a body's own limits, after the body's id: BODY.tips, BODY.slides */
const BODY_LIMITS = ["tips", "slides"] as const;

type Out = { code: number; body: unknown };
const fail = (errors: FieldError[]): Out => ({ code: 1, body: { ok: false, errors } });
/** A value of a component (SI) with its SI unit, as the hint says it: "43.17 N". */
const inSI = (component: QuantityComponent) => (si: number) => `${formatNumber(si, 4)}${component === "frictionRatio" ? "" : component === "m" ? " N·m" : " N"}`;
const usage = (why?: string): Out => fail([{ path: "", message: why ? `${why}; ${USAGE}` : USAGE }]);

function read(file: string): string | Out {
  try {
    return readFileSync(file === "-" ? 0 : file, "utf8");
  } catch (err) {
    const code = (err as NodeJS.ErrnoException).code;
    const why = code === "ENOENT" ? "no such file" : code === "EISDIR" ? "it is a folder, not a file" : code === "EACCES" ? "permission denied" : (code ?? (err as Error).message);
    return fail([{ path: "", message: `cannot read ${file}: ${why}` }]);
  }
}

/** The options before FILE, as flag → value ("" for a flag that takes none). */
function options(args: string[]): Map<string, string> | Out {
  const takes = new Set(["--limit", "--quantity", "--target", "--case", "--combination"]);
  const out = new Map<string, string>();
  for (let i = 0; i < args.length; i++) {
    const a = args[i];
    if (a === "--cases" || a === "--every-case") out.set(a, "");
    else if (takes.has(a)) {
      if (i + 1 >= args.length) return usage(`${a} needs a value`);
      out.set(a, args[++i]);
    } else return usage(`unknown option ${a}`);
  }
  return out;
}

function parsed(text: string) {
  let input: unknown;
  try {
    input = JSON.parse(text);
  } catch (err) {
    return fail([{ path: "", message: `not JSON: ${(err as Error).message}` }]);
  }
  const p = parseSketch(input);
  return p.ok ? p : fail(p.errors);
}

function limit(opts: Map<string, string>, text: string): Out {
  const range = /^([A-Za-z_]\w*)=(.+?)\.\.(.+)$/.exec(opts.get("--limit") ?? "");
  if (!range) return usage("--limit takes NAME=FROM..TO, as theta=0..80");
  const [from, to] = [Number(range[2]), Number(range[3])];
  if (!Number.isFinite(from) || !Number.isFinite(to) || from === to) return fail([{ path: "--limit", message: `${range[2]}..${range[3]} is not a range of two different numbers` }]);
  const qm = /^(.+)\.(\w+)$/.exec(opts.get("--quantity") ?? "");
  if (!qm) return usage("--quantity takes SUPPORT.COMPONENT, as rear.margin, or BODY.tips or BODY.slides, as cart.tips");
  const bodyLimit = (BODY_LIMITS as readonly string[]).includes(qm[2]) ? (qm[2] as (typeof BODY_LIMITS)[number]) : undefined;
  const component = qm[2] as QuantityComponent;
  if (!bodyLimit && !COMPONENTS.includes(component)) return fail([{ path: "--quantity", message: `${qm[2]} is not one of ${[...COMPONENTS, ...BODY_LIMITS].join(", ")}` }]);
  // a body's own limit is the limit itself (it tips, it slides): there is nothing to reach
  if (bodyLimit && opts.has("--target")) return fail([{ path: "--target", message: `${qm[1]}.${bodyLimit} is a body's own limit, reached where it ${bodyLimit === "tips" ? "starts to tip" : "starts to slide as a whole"}: it takes no --target` }]);
  const quantity: LimitQuantity = bodyLimit ? { body: qm[1], limit: bodyLimit } : { support: qm[1], component };
  let target = 0;
  const t = opts.get("--target");
  if (t !== undefined) {
    try {
      target = Number.isFinite(Number(t)) ? Number(t) : component === "frictionRatio" ? Number.NaN : evaluateToNumber(t, component === "m" ? "moment" : "force");
    } catch (err) {
      return fail([{ path: "--target", message: (err as Error).message }]);
    }
    if (!Number.isFinite(target)) return fail([{ path: "--target", message: `${t} is not a number${component === "frictionRatio" ? " (a ratio has no unit)" : ""}` }]);
  }
  const p = parsed(text);
  if ("code" in p) return p;
  if (bodyLimit) {
    const ids = p.file.bodies.map((b) => b.id);
    if (!ids.includes(qm[1])) return fail([{ path: "--quantity", message: `the sketch has no body "${qm[1]}" (bodies: ${ids.join(", ") || "none"})` }]);
    // searched only where the calc sheet's limits table searches it: a body on contacts or ties (to
    // tip), on contacts and ties alone with a μ on one (to slide as a whole)
    if (!bodyLimits(p.file).some((b) => b.body === qm[1] && b.limit === bodyLimit))
      return fail([
        {
          path: "--quantity",
          message:
            bodyLimit === "tips"
              ? `the body "${qm[1]}" has no contact or tie: nothing it bears on can let go, so it cannot tip`
              : `the body "${qm[1]}" cannot slide as a whole: it needs a contact with a friction coefficient μ, and no pin, roller or fixed support (they resist sliding)`,
        },
      ]);
  } else if (!p.file.supports.some((s) => s.id === qm[1])) return fail([{ path: "--quantity", message: `the sketch has no support "${qm[1]}"` }]);
  const head = { ok: true, parameter: range[1], from, to, quantity, ...(bodyLimit ? {} : { target }) };
  // a support's quantity short of the target: the compact hint, as "In every case" says it
  const names = elementNames(p.file);
  const hinted = (result: LimitEverywhere["result"]) => {
    if (bodyLimit || "error" in result || result.found) return {};
    const shown = inSI(component);
    const h = runNoLimitWords(result, { support: qm[1], component }, p.file.supports, names, { from, to }, { parameter: range[1], pName: range[1], targetSI: target, target: shown(target), shown });
    return h ? { hint: h.words, ...(h.wider ? { wider: h.wider } : {}) } : {};
  };
  try {
    if (opts.has("--every-case")) {
      if (opts.has("--case") || opts.has("--combination")) return usage("--every-case searches every case and combination: give it no --case or --combination");
      const runs = limitEverywhere(p.file, range[1], [from, to], quantity, target, p.sketch);
      // a parameter no run has (a misspelt name) is an error, as it is for one run
      const failed = runs.flatMap((r) => ("error" in r.result ? [r.result.error] : []));
      if (failed.length === runs.length) return fail([{ path: "", message: failed[0] }]);
      const first = firstReached(runs, from, to);
      return { code: 0, body: { ...head, runs: runs.map((r) => ({ ...r, ...hinted(r.result) })), first: first?.row.id ?? null, firstValue: first?.value ?? null } };
    }
    const sweeper = sweeperOn(p.file, { case: opts.get("--case"), combination: opts.get("--combination") }, range[1], p.sketch);
    const result = findAnyLimitWith(sweeper, [from, to], quantity, target);
    return { code: 0, body: { ...head, result, ...hinted(result) } };
  } catch (err) {
    return fail([{ path: "", message: (err as Error).message }]);
  }
}

function run(argv: string[]): Out {
  const file = argv[argv.length - 1];
  if (!file || file === "--help" || file === "-h" || (file.startsWith("--") && file !== "-")) return usage();
  const opts = options(argv.slice(0, -1));
  if ("code" in opts) return opts;
  const text = read(file);
  if (typeof text !== "string") return text;
  if (opts.has("--cases")) {
    if (opts.size > 1) return usage("--cases takes no other option");
    const p = parsed(text);
    if ("code" in p) return p;
    return { code: 0, body: { ok: true, ...solveCases(p.file) } };
  }
  if (opts.has("--limit")) return limit(opts, text);
  if (opts.size) return usage(`${[...opts.keys()][0]} needs --limit`);
  const result = solveFile(text);
  return { code: result.ok ? 0 : 1, body: result };
}

const out = run(process.argv.slice(2));
process.stdout.write(JSON.stringify(out.body, null, 2) + "\n");
process.exitCode = out.code;
