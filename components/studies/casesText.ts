// The short text forms used to edit cases in a table, and their checks. Pure functions.
//   parameter changes:  "theta = 30 deg; Q = 1500 gpm"
//   group factors:      "dead 1.2, flow 1.5"   (a group, then its factor)
//   combination terms:  "1.2 normal + 1.5 test"  (a factor, then a case id)
import { combinationWarnings } from "@/solver/cases";
import type { CombinationFile, SketchFile } from "@/solver/schema";

export type Parsed<T> = { ok: true; value: T } | { ok: false; error: string };

export function parseOverrides(text: string, parameters: readonly string[]): Parsed<Record<string, string> | undefined> {
  const t = text.trim();
  if (!t) return { ok: true, value: undefined };
  const out: Record<string, string> = {};
  // changes part at ";" — or at a "," that starts the next "name =" (a comma inside max(a, b) stays)
  for (const part of t.split(/;|,(?=\s*[A-Za-z_][A-Za-z0-9_]*\s*=(?!=))/).map((s) => s.trim()).filter(Boolean)) {
    const m = /^([A-Za-z_][A-Za-z0-9_]*)\s*=\s*(.+)$/.exec(part);
    if (!m) return { ok: false, error: `"${part}" should read name = value (e.g. theta = 30 deg)` };
    if (!parameters.includes(m[1])) return { ok: false, error: `the sketch has no parameter "${m[1]}"${parameters.length ? ` (it has ${parameters.join(", ")})` : ""}` };
    out[m[1]] = m[2].trim();
  }
  return { ok: true, value: out };
}

export function formatOverrides(o: Record<string, string | number> | undefined): string {
  return Object.entries(o ?? {})
    .map(([k, v]) => `${k} = ${v}`)
    .join("; ");
}

/** "dead 1.2, flow 1.5": a factor for each load group named; with `groups` (the groups the sketch's
 *  loads are in), a name that is none of them is refused, so a typo never leaves a load unscaled. */
export function parseFactors(text: string, groups?: readonly string[]): Parsed<Record<string, number> | undefined> {
  const t = text.trim();
  if (!t) return { ok: true, value: undefined };
  const out: Record<string, number> = {};
  for (const part of t.split(",").map((s) => s.trim()).filter(Boolean)) {
    const m = /^([A-Za-z][A-Za-z0-9 _-]*?)\s*[×x*]?\s*(-?\d+(?:\.\d+)?(?:e-?\d+)?)$/i.exec(part);
    if (!m) return { ok: false, error: `"${part}" should read group factor (e.g. dead 1.2)` };
    const name = m[1].trim();
    if (groups && !groups.includes(name)) {
      const near = groups.find((g) => g.toLowerCase() === name.toLowerCase());
      return {
        ok: false,
        error: near
          ? `no load is in group "${name}": did you mean "${near}"?`
          : `no load is in group "${name}"; ${groups.length ? `the sketch's groups are ${groups.join(", ")}` : "the sketch has no loads yet"}`,
      };
    }
    out[name] = Number(m[2]);
  }
  return { ok: true, value: out };
}

export function formatFactors(f: Record<string, number> | undefined): string {
  return Object.entries(f ?? {})
    .map(([k, v]) => `${k} ${v}`)
    .join(", ");
}

/**
 * "1.2 dead + 1.5 flow": each term a factor (1 when left out) and a case, by its id or its name
 * (any capitals, spaces allowed: "1.5 Rated flow").
 */
export function parseTerms(text: string, cases: ReadonlyArray<string | { id: string; name?: string }>): Parsed<Array<{ case: string; factor: number }>> {
  const list = cases.map((c) => (typeof c === "string" ? { id: c, name: undefined } : c));
  const parts = text
    .split("+")
    .map((s) => s.trim())
    .filter(Boolean);
  if (!parts.length) return { ok: false, error: "add at least one case, e.g. 1.2 normal + 1.5 test" };
  const out: Array<{ case: string; factor: number }> = [];
  const fold = (x: string) => x.trim().replace(/\s+/g, " ").toLowerCase();
  for (const part of parts) {
    // a factor, then the case: "1.5 test", "1.5 × test", "1.5·test", "1.5*test"
    const m = /^(?:(-?\d+(?:\.\d+)?)\s*[×x*·]?\s+|(-?\d+(?:\.\d+)?)\s*[×*·]\s*)?([A-Za-z0-9_].*)$/i.exec(part);
    if (!m) return { ok: false, error: `"${part}" should read factor case (e.g. 1.2 normal)` };
    const word = m[3].trim();
    const found = list.find((c) => c.id === word) ?? list.find((c) => c.name !== undefined && fold(c.name) === fold(word)) ?? list.find((c) => fold(c.id) === fold(word));
    if (!found) {
      // "1,5 wind": a decimal comma read as part of the case's name
      const comma = /^(-?\d+),(\d+)\s*[×x*·]?\s*\S/i.exec(part);
      if (comma && !m[1] && !m[2]) return { ok: false, error: `"${comma[1]},${comma[2]}" has a decimal comma: write the factor with a point (${comma[1]}.${comma[2]})` };
      const known = list.map((c) => (c.name && c.name !== c.id ? `${c.name} (${c.id})` : c.id)).join(", ");
      return { ok: false, error: `there is no case "${word}"${list.length ? ` (cases: ${known})` : ""}` };
    }
    const f = m[1] ?? m[2];
    out.push({ case: found.id, factor: f === undefined ? 1 : Number(f) });
  }
  return { ok: true, value: out };
}

/** The terms as the user wrote them: each case by its name when the name reads back as that case
 *  (else by its id), so "1.2 Duty" does not come back as "1.2 normal-operation". */
export function formatTerms(terms: Array<{ case: string; factor: number }>, cases: ReadonlyArray<string | { id: string; name?: string }> = []): string {
  const list = cases.map((c) => (typeof c === "string" ? { id: c, name: undefined } : c));
  const word = (id: string) => {
    const name = list.find((c) => c.id === id)?.name?.trim();
    if (!name || name.includes("+")) return id;
    const back = parseTerms(`1 ${name}`, list);
    return back.ok && back.value[0].case === id ? name : id;
  };
  return terms.map((t) => `${t.factor} ${word(t.case)}`).join(" + ");
}

/** A new id from a name: "Test pressure" → "test-pressure", unique among `taken`. */
export function idFromName(name: string, taken: readonly string[]): string {
  const base =
    name
      .toLowerCase()
      .replace(/[^a-z0-9]+/g, "-")
      .replace(/^-|-$/g, "")
      .slice(0, 24) || "case";
  let id = base;
  for (let i = 2; taken.includes(id); i++) id = `${base}-${i}`;
  return id;
}

/** A combination's load groups counted more than once, one sentence a group, naming each case as
 *  the table does (by its name; ids, the solver's default, are not shown once a case is renamed). */
export function combinationWarningWords(file: SketchFile, combination: CombinationFile): string[] {
  return combinationWarnings(file, combination, (id) => file.cases?.find((c) => c.id === id)?.name.trim() || id);
}
