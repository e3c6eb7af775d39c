// npm run -s solve -- FILE   prints the solve result JSON on stdout; invalid input exits 1 with
// { ok: false, errors } on stdout. Nothing else is written to stdout by this program; without -s,
// npm itself prints a banner ("> counterpoise@… solve") there first, which breaks a pipe into jq.
import { readFileSync } from "node:fs";
import { solveFile } from "./index";

function main(argv: string[]): number {
  const file = argv[0];
  if (!file || argv.length > 1 || file === "--help" || file === "-h") {
    process.stdout.write(JSON.stringify({ ok: false, errors: [{ path: "", message: "usage: npm run -s solve -- FILE (FILE is a sketch file, or - for standard input; -s keeps npm's banner off standard output)" }] }, null, 2) + "\n");
    return 1;
  }
  let text: string;
  try {
    text = readFileSync(file === "-" ? 0 : file, "utf8");
  } catch (err) {
    const code = (err as NodeJS.ErrnoException).code;
    const why = code === "ENOENT" ? "no such file" : code === "EISDIR" ? "it is a folder, not a file" : code === "EACCES" ? "permission denied" : (code ?? (err as Error).message);
    process.stdout.write(JSON.stringify({ ok: false, errors: [{ path: "", message: `cannot read ${file}: ${why}` }] }, null, 2) + "\n");
    return 1;
  }
  const result = solveFile(text);
  process.stdout.write(JSON.stringify(result, null, 2) + "\n");
  return result.ok ? 0 : 1;
}

process.exitCode = main(process.argv.slice(2));
