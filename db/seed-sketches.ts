// The demo workspace's sketches: each demo scenario with two or three versions whose messages
// tell how the design moved. Fixed ids, and a sketch that exists is left alone (idempotent).
// Invented scenarios for the demo only. Runs under tsx from db/seed.ts (relative imports).
import { readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import type { drizzle } from "drizzle-orm/node-postgres";
import { parseSketch } from "../solver";
import { summarizeSolve } from "../lib/sketch-document";
import * as schema from "./schema";

type SeedDb = ReturnType<typeof drizzle<typeof schema>>;
type Doc = Record<string, unknown> & { parameters?: Record<string, unknown>; bodies: Array<Record<string, unknown>>; supports: Array<Record<string, unknown>>; ports: Array<Record<string, unknown>> };
type Step = { by: "eddie" | "olivia"; daysAgo: number; message: string; edit?: (d: Doc) => void };
export type DemoSketch = { id: string; file: string; title: string; description: string; tags: string[]; steps: Step[] };

const DEMO_AUTHORS = { eddie: "demo-eddie-editor", olivia: "demo-olivia-owner" } as const;

/** A sketch file of the demo, read from the committed worked examples. */
function readSketchFile(name: string): Doc {
  return JSON.parse(readFileSync(fileURLToPath(new URL(`../tests/fixtures/sketches/${name}.json`, import.meta.url)), "utf8"));
}

export const DEMO_SKETCHES: DemoSketch[] = [
  {
    id: "6d656d6f-0000-4000-8000-0000000000a1",
    file: "pump-skid-discharge",
    title: "Dewatering pump skid, discharge test",
    description: "850 kg skid on two steel feet with friction (μ = 0.4): side suction, raised discharge at 120°. Are the feet enough without anchor bolts?",
    tags: ["pumps", "pier 7"],
    steps: [
      { by: "eddie", daysAgo: 9, message: "Skid as drawn from the general arrangement: two steel feet on the slab, 10 kg/s", edit: (d) => (d.parameters!.mdot = "10 kg/s") },
      { by: "eddie", daysAgo: 7, message: "Raised the flow to the pump's duty point, 10 → 12 kg/s" },
      { by: "eddie", daysAgo: 5, message: "Moved the rear foot 0.3 m east to clear the drain channel", edit: (d) => (d.supports[0].at = [0.5, 0]) },
    ],
  },
  {
    id: "6d656d6f-0000-4000-8000-0000000000a2",
    file: "fire-monitor-trailer",
    title: "Fire-fighting monitor trailer, forward low throw",
    description: "Monitor trailer on a rear stabiliser leg, its wheel and a front jack on asphalt (μ = 0.7), throwing forward at 15° from 2.8 m. Does the front jack stay down at the rated flow?",
    tags: ["fire water", "mobile"],
    steps: [
      { by: "eddie", daysAgo: 6, message: "Trailer on its leg, wheel and front jack; monitor throwing 1500 gpm at 15° from 2.8 m", edit: (d) => (d.parameters!.Q = "1500 gpm") },
      { by: "eddie", daysAgo: 4, message: "Raised the flow to the monitor's 2000 gpm rating: the front jack lifts off" },
      {
        by: "olivia",
        daysAgo: 2,
        message: "Added 400 kg of water ballast over the front jack: all three feet bear again",
        edit: (d) => {
          d.bodies[0].mass = 1500;
          d.bodies[0].cg = [2.0, 0.8];
        },
      },
    ],
  },
  {
    id: "6d656d6f-0000-4000-8000-0000000000a3",
    file: "thrust-stand-tips",
    title: "Jet thrust stand, overturning check",
    description: "200 kg stand pinned at its front edge, resting on a rear pad, with a 2.2 kN test jet. Where must the jet sit so the rear pad never has to pull?",
    tags: ["test rig"],
    steps: [
      { by: "eddie", daysAgo: 8, message: "Stand with the 2.2 kN test jet at 1.5 m: it tips about the front pin" },
      { by: "eddie", daysAgo: 3, message: "Lowered the jet from 1.5 m to 0.6 m: the rear pad bears again", edit: (d) => (d.ports[0].at = [0, 0.6]) },
    ],
  },
  {
    id: "6d656d6f-0000-4000-8000-0000000000a4",
    file: "pipe-bend-anchor",
    title: "DN300 × DN200 reducing bend on a thrust anchor",
    description: "60° reducing bend of a buried water main, plan view, on a concrete anchor block. Anchor load at working pressure and at the hydrotest.",
    tags: ["pipework", "buried main"],
    steps: [
      { by: "olivia", daysAgo: 12, message: "Bend at the 6 bar working pressure, anchor block at the meeting point of the axes" },
      { by: "eddie", daysAgo: 10, message: "Hydrotest case: 9 bar at the inlet", edit: (d) => (d.parameters!.p1 = "900 kPa") },
    ],
  },
];

/** The documents of a demo sketch's versions, in order (each step edits the one before). */
export function demoVersions(s: DemoSketch): Array<{ step: Step; doc: Doc }> {
  const doc = readSketchFile(s.file);
  // Steps are cumulative: apply the first step's edit, then each later one on top. A step
  // without an edit is the committed file as it stands, so edits made before it are undone.
  const out: Array<{ step: Step; doc: Doc }> = [];
  let current = structuredClone(doc);
  for (const step of s.steps) {
    if (step.edit) step.edit(current);
    else current = structuredClone(doc);
    out.push({ step, doc: structuredClone(current) });
  }
  return out;
}

export async function seedDemoSketches(db: SeedDb, workspaceId: string): Promise<void> {
  const { sketch, sketchVersion, auditEvent } = schema;
  for (const s of DEMO_SKETCHES) {
    const versions = demoVersions(s);
    const first = versions[0].step;
    const last = versions[versions.length - 1].step;
    const at = (daysAgo: number) => new Date(Date.now() - daysAgo * 86_400_000);
    const [created] = await db
      .insert(sketch)
      .values({
        id: s.id,
        workspaceId,
        title: s.title,
        description: s.description,
        tags: s.tags,
        latestVersion: versions.length,
        createdBy: DEMO_AUTHORS[first.by],
        createdAt: at(first.daysAgo),
        updatedBy: DEMO_AUTHORS[last.by],
        updatedAt: at(last.daysAgo),
      })
      .onConflictDoNothing()
      .returning({ id: sketch.id });
    if (!created) continue;
    for (const [i, { step, doc }] of versions.entries()) {
      const parsed = parseSketch(doc);
      if (!parsed.ok) throw new Error(`demo sketch ${s.file} v${i + 1} does not parse: ${parsed.errors[0]?.path} ${parsed.errors[0]?.message}`);
      const summary = summarizeSolve(parsed);
      await db.insert(sketchVersion).values({
        sketchId: s.id,
        number: i + 1,
        message: step.message,
        document: parsed.file,
        formatVersion: parsed.file.version,
        status: summary.status,
        largestReaction: summary.largestReaction,
        summary,
        authorId: DEMO_AUTHORS[step.by],
        createdAt: at(step.daysAgo),
      });
      await db.insert(auditEvent).values({
        action: i === 0 ? "sketch.create" : "sketch.save",
        at: at(step.daysAgo),
        actorId: DEMO_AUTHORS[step.by],
        workspaceId,
        targetType: "sketch",
        targetId: s.id,
        detail: i === 0 ? { sketchId: s.id, title: s.title } : { sketchId: s.id, title: s.title, number: i + 1, message: step.message },
      });
    }
  }
}
