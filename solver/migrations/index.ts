// The chain of sketch-format migrations: each step takes a document of version `from` to
// `from + 1`. A file is brought up to CURRENT_VERSION before it is validated. Each format adds
// its step here (solver/migrations/NNN-<what>.ts) with a test of its own.
import { CURRENT_VERSION, FORMAT } from "../schema";
import type { FieldError } from "../types";
import { loadCases } from "./002-load-cases";
import { underlay } from "./003-underlay";
import { momentumFactor } from "./004-momentum-factor";
import { gravityDirection } from "./005-gravity-direction";
import { combinationStudies } from "./006-combination-studies";

export interface Migration {
  from: number;
  /** what the step changes, in a sentence */
  description: string;
  up: (doc: Record<string, unknown>) => Record<string, unknown>;
}

export const MIGRATIONS: readonly Migration[] = [loadCases, underlay, momentumFactor, gravityDirection, combinationStudies];

export type MigrateResult = { ok: true; doc: Record<string, unknown>; applied: number[] } | { ok: false; errors: FieldError[] };

export function migrateSketch(input: unknown, chain: readonly Migration[] = MIGRATIONS, target = CURRENT_VERSION): MigrateResult {
  if (typeof input !== "object" || input === null || Array.isArray(input))
    return { ok: false, errors: [{ path: "", message: "a sketch file must be a JSON object" }] };
  const doc = input as Record<string, unknown>;
  if (doc.format !== FORMAT)
    return { ok: false, errors: [{ path: "format", message: `must be "${FORMAT}" (this does not look like a Counterpoise sketch file)` }] };
  const version = doc.version;
  if (typeof version !== "number" || !Number.isInteger(version) || version < 1)
    return { ok: false, errors: [{ path: "version", message: "must be a whole number, 1 or more" }] };
  if (version > target)
    return {
      ok: false,
      errors: [{ path: "version", message: `is ${version}, newer than this version of Counterpoise reads (${target}); update Counterpoise to open it` }],
    };
  let current: Record<string, unknown> = structuredClone(doc);
  const applied: number[] = [];
  for (let v = version; v < target; v++) {
    const step = chain.find((m) => m.from === v);
    if (!step) return { ok: false, errors: [{ path: "version", message: `no migration from version ${v} to ${v + 1}` }] };
    current = { ...step.up(current), version: v + 1 };
    applied.push(v);
  }
  return { ok: true, doc: current, applied };
}
