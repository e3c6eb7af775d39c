// The demo workspace's sketches: each demo scenario with two or three versions whose messages
// tell how the design moved. Fixed ids, and a sketch that exists is left alone (idempotent) —
// unless nobody has touched it and this release seeds it differently (`untouchedAndStale`): then it
// is seeded afresh, so `npm start` after an update shows the demos the README describes.
// Invented scenarios for the demo only (the editor's examples and a worked example). Runs under
// tsx from db/seed.ts (relative imports).
import { readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { isDeepStrictEqual } from "node:util";
import { and, count, eq, inArray } from "drizzle-orm";
import type { drizzle } from "drizzle-orm/node-postgres";
import { parseSketch } from "../solver";
import { summarizeSolve } from "../lib/sketch-document";
import * as schema from "./schema";

type SeedDb = ReturnType<typeof drizzle<typeof schema>>;
type Doc = Record<string, unknown> & { parameters?: Record<string, unknown>; bodies: Array<Record<string, unknown>>; supports: Array<Record<string, unknown>>; ports: Array<Record<string, unknown>> };
type Who = "eddie" | "olivia" | "chen";
/** `notes`: the drawing's notes from this version on, so they tell what this version's inputs are. */
type Step = { by: Who; daysAgo: number; message: string; edit?: (d: Doc) => void; notes?: string };
type ReviewStep = { version: number; step: "submit" | "check" | "return" | "approve"; by: Who; daysAgo: number; note?: string };
type DemoComment = { version: number; by: Who; daysAgo: number; body: string; pin?: schema.CommentPin; replies?: Array<{ by: Who; daysAgo: number; body: string }>; resolved?: Who };
export type DemoSketch = { id: string; file: string; title: string; description: string; tags: string[]; steps: Step[]; review?: ReviewStep[]; comments?: DemoComment[] };

const DEMO_AUTHORS = { eddie: "demo-eddie-editor", olivia: "demo-olivia-owner", chen: "demo-chen-checker" } as const;
const DEMO_NAMES = { eddie: "Eddie Editor", olivia: "Olivia Owner", chen: "Chen Checker" } as const;
const NEXT_STATE = { submit: "submitted", check: "checked", return: "returned", approve: "approved" } as const;

/** A sketch file of the demo: the editor's examples and the worked examples, by path from the repository root. */
function readSketchFile(path: string): Doc {
  return JSON.parse(readFileSync(fileURLToPath(new URL(`../${path}`, import.meta.url)), "utf8"));
}

/**
 * The exhaust stack's cases at the site's 40 m/s design wind (the example runs them at 30 m/s),
 * the blocks' weight lowering the centre of gravity (0.45 m up) as it adds to the stack's 900 kg,
 * and the sweep plotting the upwind edge's friction too.
 */
function stackCasesAt40(d: Doc): void {
  const body = d.bodies[0];
  body.cg = [1.5, "(900 kg * 3.6 m + ballast * 0.45 m) / (900 kg + ballast)"];
  const cases = d.cases as Array<Record<string, unknown>>;
  d.cases = cases
    .filter((c) => c.id !== "storm")
    .map((c) => {
      if (c.id === "running") return { ...c, name: "Engine running, 40 m/s design wind", parameters: { v: "40 m/s" } };
      if (c.id === "stopped") return { ...c, name: "Engine stopped, 40 m/s design wind", parameters: { v: "40 m/s", p_duct: "0 kPa" } };
      if (c.id === "wind-30") return { ...c, id: "wind-40", name: "Wind only, 40 m/s", parameters: { v: "40 m/s" } };
      return c;
    });
  const [uplift] = d.combinations as Array<{ terms: Array<{ case: string }> }>;
  for (const t of uplift.terms) if (t.case === "wind-30") t.case = "wind-40";
  const [sweep] = d.sweeps as Array<{ quantities: unknown[] }>;
  sweep.quantities.push({ support: "upwind", component: "frictionMargin" });
}

/** The exhaust stack as built, for its later versions' notes. */
const STACK =
  "An 8 m stack (600 mm) stands on a 3 m skid, 0.7 m deep, laid unbolted on a concrete pad, to carry a standby generator's exhaust during an outage. The gas comes in through a 500 mm flexible duct on the side of the stack, 1.6 m up, with 2 kPa of back-pressure, and leaves at the top. Wind on the stack: q = ½ρv², drag coefficient 0.7 on the projected width.";

/**
 * The roof fan's wind cases at the roof's 45 m/s design wind (the example runs them at 30 m/s):
 * each case's name says the speed it sets.
 */
function fanCasesAt45(d: Doc): void {
  d.cases = (d.cases as Array<Record<string, unknown>>).map((c) =>
    c.id === "running-wind"
      ? { ...c, name: "Fan running, 45 m/s design wind", parameters: { v: "45 m/s" } }
      : c.id === "stopped-wind"
        ? { ...c, name: "Fan stopped, 45 m/s design wind", parameters: { v: "45 m/s", Q: "0 m^3/s" } }
        : c,
  );
}

/** The roof fan bolted down: the inlet-end foot pinned, the discharge-end foot in slotted holes (a roller), and the sweeps plotting the bolts' forces. */
function fanBolted(d: Doc): void {
  d.supports = [
    { id: "inlet_foot", label: "inlet-end foot (bolted)", body: "fan", kind: "pin", at: [0.15, 0] },
    { id: "outlet_foot", label: "discharge-end foot (slotted holes)", body: "fan", kind: "roller", at: [1.05, 0], angle: 90 },
  ];
  for (const sweep of d.sweeps as Array<{ quantities: unknown[] }>) sweep.quantities = [{ support: "outlet_foot", component: "n" }, { support: "inlet_foot", component: "fx" }];
}

/** The roof fan as set on its frame, for its later versions' notes. */
const FAN =
  "A 1 m axial fan in its short duct casing, 340 kg with its motor, bell-mouth and discharge bend, on a steel roof frame. It draws 8 m³/s of air (1.2 kg/m³) in through the bell-mouth (−65 Pa gauge at 10.2 m/s) and turns it straight up, out of a 0.8 m cowl at 15.9 m/s: the air pushes the fan 46 N toward its discharge end and 153 N down. Wind on the discharge end, against that push: q = ½ρv², force coefficient 1.1 on the 1.1 m wide casing.";

export const DEMO_SKETCHES: DemoSketch[] = [
  {
    id: "6d656d6f-0000-4000-8000-0000000000a1",
    file: "canvas/examples/pump-skid.json",
    title: "Dewatering pump skid, discharge test",
    description: "850 kg diesel pump skid on two timber bearers (μ = 0.4): suction low at the rear, discharge up through a bend at the front. Do the bearers hold it without anchor bolts?",
    tags: ["pumps", "pier 7"],
    steps: [
      { by: "eddie", daysAgo: 9, message: "Skid as drawn from the general arrangement, at half the duty flow" },
      { by: "eddie", daysAgo: 7, message: "Full duty flow: 1800 → 3600 L/min", edit: (d) => (d.parameters!.Q = "3600 lpm") },
      { by: "eddie", daysAgo: 5, message: "Moved the rear bearer 0.3 m east to clear the drain channel", edit: (d) => (d.supports[0].at = [0.6, 0]) },
    ],
    review: [
      { version: 2, step: "submit", by: "eddie", daysAgo: 6.9 },
      { version: 2, step: "check", by: "chen", daysAgo: 6.5, note: "Friction demand is well under μ = 0.4 at both bearers." },
      { version: 2, step: "approve", by: "olivia", daysAgo: 6 },
    ],
    comments: [
      {
        version: 2,
        by: "chen",
        daysAgo: 6.6,
        body: "Suction gauge pressure of **−0.4 bar**: is that at the duty flow? @Eddie please confirm.",
        pin: { kind: "element", elementId: "suction" },
        replies: [{ by: "eddie", daysAgo: 6.55, body: "Yes, from the pump curve at 3600 L/min." }],
        resolved: "chen",
      },
    ],
  },
  {
    id: "6d656d6f-0000-4000-8000-0000000000a2",
    file: "canvas/examples/fire-monitor-trailer.json",
    title: "Fire-fighting monitor trailer",
    description: "950 kg monitor trailer on its axle, a rear stabiliser foot and a front jack on wet asphalt, throwing forward and up from 2.4 m. Does the front jack stay down at the rated flow?",
    tags: ["fire water", "mobile"],
    steps: [
      { by: "eddie", daysAgo: 6, message: "Trailer set up on foot, axle and jack; monitor at 1250 gpm" },
      {
        by: "eddie",
        daysAgo: 4,
        message: "Raised the flow to the 2000 gpm rating: the front jack lifts off and the trailer slides on its wheels",
        edit: (d) => (d.parameters!.Q = "2000 gpm"),
        notes:
          "A 950 kg monitor trailer set up on its axle, a rear stabiliser foot and a front jack on a skid plate, on wet asphalt (μ = 0.55 at the foot and the tyres). The monitor throws its rated 2000 gpm through a 1¾ in tip, forward and up, from 2.4 m. The jet's reaction pulls the top of the riser back and down: at this flow the front jack lifts off and the trailer slides: the wheels would need μ = 1.76.",
      },
      {
        by: "olivia",
        daysAgo: 2,
        message: "Added 300 kg of water ballast toward the front: the jack bears again; the wheels still slip",
        edit: (d) => {
          d.bodies[0].mass = "1250 kg";
          d.bodies[0].cg = [2.1, 0.85];
        },
        notes:
          "The monitor trailer with 300 kg of water ballast toward the front: 1250 kg in all, its centre of gravity 2.1 m from the rear foot and 0.85 m up. At the rated 2000 gpm (1¾ in tip, forward and up from 2.4 m) the front jack bears again, but the wheels still slip on wet asphalt: they need μ = 0.70 and the tyres give 0.55 (the foot needs 0.41 of its 0.55). Taken as drawn: the wheels braked, so the tyres carry friction; the supply hose laid flat and slack, carrying no thrust into the trailer.",
      },
    ],
    review: [{ version: 3, step: "submit", by: "olivia", daysAgo: 1.9 }],
    comments: [
      { version: 3, by: "chen", daysAgo: 1.5, body: "The wheels still slip (μ 0.70 needed, 0.55 on wet asphalt): may we chock them on site?", pin: { kind: "element", elementId: "axle" } },
      { version: 3, by: "chen", daysAgo: 1.4, body: "Jet reaction taken at the tip, not the monitor's swivel: fine for this check." },
    ],
  },
  {
    id: "6d656d6f-0000-4000-8000-0000000000a3",
    file: "tests/fixtures/sketches/thrust-stand-tips.json",
    title: "Jet thrust stand, overturning check",
    description: "200 kg stand pinned at its front edge, resting on a rear pad, with a 2.2 kN test jet. Where must the jet sit so the rear pad never has to pull?",
    tags: ["test rig"],
    steps: [
      { by: "eddie", daysAgo: 8, message: "Stand with the 2.2 kN test jet at 1.5 m: it tips about the front pin" },
      {
        by: "eddie",
        daysAgo: 3,
        message: "Lowered the jet from 1.5 m to 0.6 m: the rear pad bears again",
        edit: (d) => (d.ports[0].at = [0, 0.6]),
        notes:
          "A 200 kg stand pinned to the floor at its front edge and resting on a rear pad. The test jet, lowered from 1.5 m to 0.6 m, pushes it forward; its thrust is now below W·d/h, so the rear pad bears instead of having to pull. Against overturning about the front pin the factor is only 1.19, under the 1.5 asked for.",
      },
      {
        by: "eddie",
        daysAgo: 1,
        message: "The test pad falls 3° toward the front pin (gravity turned 3°): the rear pad still bears; it would unload at 9.5°",
        edit: (d) => {
          d.parameters!.slope = "3 deg";
          d.gravityAngle = "-90 deg + slope";
        },
        notes:
          "A 200 kg stand pinned to the floor at its front edge and resting on a rear pad, the test jet at 0.6 m. The test pad's floor falls 3° toward the front pin, drawn as gravity turned by the slope: the rear pad still bears; it would unload at 9.5°. Against overturning about the front pin the factor is 1.13, under the 1.5 asked for: ballast the stand or hold the rear pad down before the test.",
      },
    ],
  },
  {
    id: "6d656d6f-0000-4000-8000-0000000000a4",
    file: "canvas/examples/pipe-bend-anchor.json",
    title: "DN150 bend on the riser anchor",
    description: "Long-radius 90° bend where the pump discharge turns up the riser, on one anchor: pressure thrust, momentum and the weight of the bend full of water.",
    tags: ["pipework", "anchors"],
    steps: [
      { by: "olivia", daysAgo: 12, message: "Bend at the 10 bar working pressure" },
      {
        by: "eddie",
        daysAgo: 10,
        message: "Hydrotest case: 15 bar at the inlet",
        edit: (d) => {
          d.parameters!.p_in = "15 bar";
        },
        notes:
          "A DN150 long-radius 90° bend where a pump discharge turns up a riser, in elevation, at its hydrotest pressure: water at 15 bar flows in from the left and leaves upward a little lower: the 0.45 m rise and the bend's loss (K ≈ 0.25) take about 5 kPa. One anchor at the bend takes everything: the pressure thrust on both faces, the change of momentum and the weight of the bend full of water (its 92 kg is the bend and its flanged stubs with the water inside them: a body's mass is everything inside the control volume). An anchor designer wants the load on the support: the reactions reversed, the “Load on the support” view of the table.",
      },
    ],
  },
  {
    id: "6d656d6f-0000-4000-8000-0000000000a5",
    file: "canvas/examples/washing-cart.json",
    title: "Pressure-washing cart with a fixed lance",
    description: "85 kg cart with a lance clamped at 1.15 m, 40 L/min at 500 bar. How far can the lance be raised before the cart tips back off its front caster?",
    tags: ["cleaning", "mobile"],
    steps: [
      { by: "eddie", daysAgo: 3, message: "Lance aimed steeply down at −75° for the tank foot" },
      {
        by: "eddie",
        daysAgo: 2,
        message: "Raised the lance to −50°: the cart tips back off its front caster",
        edit: (d) => (d.parameters!.theta = "-50 deg"),
        notes:
          "An 85 kg wheeled cart carries a lance clamped at 1.15 m: 40 L/min at 500 bar through a small tip, raised to −50° to reach higher up the tank wall. The jet's reaction pushes the top of the cart back and up, and at this angle the cart tips back off its front caster. Braked rear wheels (μ = 0.6) stop it sliding; the front caster is free.",
      },
      {
        by: "olivia",
        daysAgo: 1,
        message: "Clamped 60 kg of ballast to the base: the caster bears again, with 1.55 against tipping back",
        edit: (d) => (d.bodies[0].mass = "145 kg"),
        notes:
          "The cart with 60 kg of ballast clamped to its base (145 kg in all) and the lance at −50°: 40 L/min at 500 bar through a small tip, clamped at 1.15 m. The front caster bears again, with a factor of 1.55 against tipping back (45 kg gave only 1.39). Braked rear wheels (μ = 0.6) stop it sliding; the front caster is free.",
      },
    ],
  },
  {
    id: "6d656d6f-0000-4000-8000-0000000000a6",
    file: "canvas/examples/exhaust-stack.json",
    title: "Standby generator exhaust stack, temporary skid",
    description: "8 m stack on an unbolted 3 m skid for the outage. How much ballast keeps the upwind edge down in the site's design wind, with the engine stopped?",
    tags: ["exhaust", "outage"],
    steps: [
      { by: "eddie", daysAgo: 4, message: "Stack on its skid, engine running, 30 m/s wind" },
      {
        by: "eddie",
        daysAgo: 2.5,
        message: "Site design wind is 40 m/s, and the cases run at it: the upwind edge lifts even with the engine running",
        edit: (d) => {
          d.parameters!.v = "40 m/s";
          stackCasesAt40(d);
        },
        notes: `${STACK} At the site's design wind of 40 m/s the upwind edge lifts, even with the engine running (the duct's pressure and the gas entering push against the wind), and every case tips. Ballast is next: blocks on the skid lower the centre of gravity as they add weight.`,
      },
      {
        by: "eddie",
        daysAgo: 1.5,
        message: "1200 kg of concrete blocks on the skid: every case holds at the 40 m/s design wind, with its factors met",
        edit: (d) => (d.parameters!.ballast = "1200 kg"),
        notes: `${STACK} With 1200 kg of concrete blocks on the skid (their centre 0.45 m up) the upwind edge bears again at the site's design wind of 40 m/s, engine running or stopped, with factors of 1.83 or more against overturning and 3.06 against sliding; the factored uplift check holds with 1.10 against the 1.0 it asks. In that check the lightly loaded upwind edge needs more friction than its share, but the skid as a whole has friction to spare (1.84). 900 kg was not enough: engine stopped, the upwind edge slipped and the uplift check tipped.`,
      },
    ],
  },
  {
    id: "6d656d6f-0000-4000-8000-0000000000a7",
    file: "canvas/examples/roof-fan.json",
    title: "Roof extract fan on its frame",
    description: "1 m axial fan on the plant-room roof, its feet on neoprene pads, not yet bolted. Does it stay put in the roof's design wind, running or stopped?",
    tags: ["ventilation", "roof"],
    steps: [
      { by: "eddie", daysAgo: 11, message: "Fan on its pads on the roof frame: 8 m³/s, discharge straight up, wind cases at 30 m/s" },
      {
        by: "eddie",
        daysAgo: 9,
        message: "Wind cases at the roof's 45 m/s design wind: the discharge-end foot lifts and the fan tips, running or stopped",
        edit: (d) => {
          d.parameters!.v = "45 m/s";
          fanCasesAt45(d);
        },
        notes: `${FAN} Its feet sit on neoprene pads (μ = 0.6), not bolted. At the roof's 45 m/s design wind the fan tips about its inlet-end foot, running or stopped: the discharge-end foot lifts from 42.7 m/s with the fan stopped, from 44.4 m/s with it running. The feet must be bolted to the frame.`,
      },
      {
        by: "eddie",
        daysAgo: 7,
        message: "Bolted the feet: the inlet-end foot pinned, the discharge-end foot in slotted holes",
        edit: fanBolted,
        notes: `${FAN} The feet are bolted to the frame: the inlet-end foot pinned, the discharge-end foot in slotted holes (a roller, free along the fan's axis). At the roof's 45 m/s design wind the fan holds in every case: the inlet-end bolts take the whole sideways load, 2.1 kN with the fan stopped, and the discharge-end bolts hold that foot down with 206 N.`,
      },
    ],
    review: [
      { version: 1, step: "submit", by: "eddie", daysAgo: 10.9 },
      { version: 1, step: "return", by: "chen", daysAgo: 10.2, note: "30 m/s is the open-ground figure: the wind report gives 45 m/s at the roof edge. Please run the wind cases at 45 m/s." },
      { version: 3, step: "submit", by: "eddie", daysAgo: 6.9 },
      { version: 3, step: "check", by: "chen", daysAgo: 6.2, note: "Inlet-end bolts: 2.1 kN of shear; discharge-end bolts: 206 N of uplift; both with the fan stopped." },
    ],
    comments: [
      {
        version: 2,
        by: "chen",
        daysAgo: 8.6,
        body: "Running only holds the discharge-end foot down to 44.4 m/s, and the fan will be stopped in a storm anyway. @Eddie can the feet be bolted to the frame?",
        pin: { kind: "element", elementId: "outlet_foot" },
        replies: [{ by: "eddie", daysAgo: 8.5, body: "Yes, the frame is drilled for them. I will slot the discharge end so the casing can grow when warm." }],
        resolved: "chen",
      },
    ],
  },
];

/** The documents of a demo sketch's versions, in order (each step edits the one before). */
export function demoVersions(s: DemoSketch): Array<{ step: Step; doc: Doc }> {
  // the drawing carries the sketch's name, as one saved from the editor does
  const doc: Doc = { ...readSketchFile(s.file), title: s.title };
  // Steps are cumulative: apply the first step's edit, then each later one on top. A step
  // without an edit is the committed file as it stands, so edits made before it are undone.
  const out: Array<{ step: Step; doc: Doc }> = [];
  let current = structuredClone(doc);
  for (const step of s.steps) {
    if (step.edit) step.edit(current);
    else current = structuredClone(doc);
    if (step.notes) current.description = step.notes;
    out.push({ step, doc: structuredClone(current) });
  }
  return out;
}

type PendingEvent = typeof schema.auditEvent.$inferInsert & { at: Date };

/** Seeds `sketches` (the demo's, unless a test passes others) into the workspace. */
export async function seedDemoSketches(db: SeedDb, workspaceId: string, sketches: readonly DemoSketch[] = DEMO_SKETCHES): Promise<void> {
  const { sketch, sketchVersion, auditEvent } = schema;
  // audit rows go in last, oldest first, so their ids run in time order as they would in use
  const events: PendingEvent[] = [];
  for (const s of sketches) {
    const versions = demoVersions(s);
    if (await untouchedAndStale(db, s, versions)) {
      // its versions, sign-off and comments go with it; so does its history in the audit log
      await db.delete(sketch).where(eq(sketch.id, s.id));
      await db.delete(auditEvent).where(and(eq(auditEvent.targetType, "sketch"), eq(auditEvent.targetId, s.id)));
    }
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
      events.push({
        action: i === 0 ? "sketch.create" : "sketch.save",
        at: at(step.daysAgo),
        actorId: DEMO_AUTHORS[step.by],
        workspaceId,
        targetType: "sketch",
        targetId: s.id,
        detail: i === 0 ? { sketchId: s.id, title: s.title } : { sketchId: s.id, title: s.title, number: i + 1, message: step.message },
      });
    }
    events.push(...(await seedReview(db, workspaceId, s)));
  }
  events.sort((a, b) => a.at.getTime() - b.at.getTime());
  for (const e of events) await db.insert(auditEvent).values(e);
}

/**
 * Whether the demo sketch in the database is as a seed left it and differs from what this one
 * writes. As a seed left it, judged by what this seed writes: the same versions (number, author
 * and message each), its details not edited since its last version, no sign-off step or comment
 * but the seed's own (author, step or words), no forks and no uploads. Differs: the title,
 * description, tags or any version's document (a changed scenario, or one brought to a newer
 * format) are not what this seed writes. When in doubt it is touched: someone's work is never
 * seeded over.
 */
export async function untouchedAndStale(db: SeedDb, s: DemoSketch, versions: Array<{ step: Step; doc: Doc }>): Promise<boolean> {
  const { sketch, sketchVersion, signOff, comment, upload } = schema;
  const [row] = await db.select().from(sketch).where(eq(sketch.id, s.id));
  if (!row) return false;
  const stored = await db.select().from(sketchVersion).where(eq(sketchVersion.sketchId, s.id)).orderBy(sketchVersion.number);
  const sameVersions =
    stored.length === versions.length &&
    row.latestVersion === versions.length &&
    stored.every((v, i) => v.number === i + 1 && v.authorId === DEMO_AUTHORS[versions[i].step.by] && v.message === versions[i].step.message);
  if (!sameVersions) return false;
  // a rename, a new tag or a new description moves updatedAt past the last save
  if (Math.abs(row.updatedAt.getTime() - stored[stored.length - 1].createdAt.getTime()) > 60_000) return false;
  const ids = stored.map((v) => v.id);
  const numberOf = new Map(stored.map((v) => [v.id, v.number]));
  const steps = await db.select().from(signOff).where(inArray(signOff.versionId, ids));
  const seededStep = (x: (typeof steps)[number]) =>
    (s.review ?? []).some((r) => numberOf.get(x.versionId) === r.version && r.step === x.step && DEMO_AUTHORS[r.by] === x.actorId && (r.note ?? "") === x.note);
  if (!steps.every(seededStep)) return false;
  const words = (s.comments ?? []).flatMap((c) => [{ by: c.by, body: c.body }, ...(c.replies ?? [])]);
  const comments = await db.select().from(comment).where(inArray(comment.versionId, ids));
  if (!comments.every((c) => words.some((w) => DEMO_AUTHORS[w.by] === c.authorId && w.body === c.body))) return false;
  const [forks] = await db.select({ n: count() }).from(sketch).where(inArray(sketch.forkedFromVersionId, ids));
  const [uploads] = await db.select({ n: count() }).from(upload).where(eq(upload.sketchId, s.id));
  if (forks.n > 0 || uploads.n > 0) return false;
  if (row.title !== s.title || row.description !== s.description || !isDeepStrictEqual(row.tags, s.tags)) return true;
  return versions.some(({ doc }, i) => {
    const parsed = parseSketch(doc);
    return parsed.ok && !isDeepStrictEqual(stored[i].document, JSON.parse(JSON.stringify(parsed.file)));
  });
}

/** The demo's sign-off steps and comment threads (written straight to the tables, as the API would). */
async function seedReview(db: SeedDb, workspaceId: string, s: DemoSketch): Promise<PendingEvent[]> {
  const { sketchVersion, signOff, comment } = schema;
  const events: PendingEvent[] = [];
  const at = (daysAgo: number) => new Date(Date.now() - daysAgo * 86_400_000);
  const versionId = async (n: number) => (await db.select({ id: sketchVersion.id }).from(sketchVersion).where(and(eq(sketchVersion.sketchId, s.id), eq(sketchVersion.number, n))))[0].id;
  const event = (action: string, by: Who, daysAgo: number, detail: Record<string, unknown>) =>
    events.push({ action, at: at(daysAgo), actorId: DEMO_AUTHORS[by], workspaceId, targetType: "sketch", targetId: s.id, detail: { sketchId: s.id, title: s.title, ...detail } });
  let state: schema.SketchVersion["reviewState"] = "draft";
  for (const r of s.review ?? []) {
    const id = await versionId(r.version);
    const to = NEXT_STATE[r.step];
    await db.insert(signOff).values({ versionId: id, step: r.step, fromState: state, toState: to, actorId: DEMO_AUTHORS[r.by], actorName: DEMO_NAMES[r.by], note: r.note ?? "", at: at(r.daysAgo) });
    await db.update(sketchVersion).set({ reviewState: to, ...(r.step === "check" ? { checkedBy: DEMO_AUTHORS[r.by] } : {}) }).where(eq(sketchVersion.id, id));
    event(`signoff.${r.step}`, r.by, r.daysAgo, { number: r.version, ...(r.note ? { note: r.note } : {}) });
    state = to;
  }
  for (const c of s.comments ?? []) {
    const id = await versionId(c.version);
    const mentions = /@Eddie/.test(c.body) ? [DEMO_AUTHORS.eddie] : [];
    const [root] = await db
      .insert(comment)
      .values({ versionId: id, authorId: DEMO_AUTHORS[c.by], body: c.body, pin: c.pin ?? null, mentions, createdAt: at(c.daysAgo), ...(c.resolved ? { resolvedAt: at(c.daysAgo - 0.1), resolvedBy: DEMO_AUTHORS[c.resolved] } : {}) })
      .returning({ id: comment.id });
    event("comment.create", c.by, c.daysAgo, { number: c.version, commentId: root.id, reply: false, note: c.body.slice(0, 140) });
    for (const r of c.replies ?? []) {
      await db.insert(comment).values({ versionId: id, parentId: root.id, authorId: DEMO_AUTHORS[r.by], body: r.body, createdAt: at(r.daysAgo) });
      event("comment.create", r.by, r.daysAgo, { number: c.version, commentId: root.id, reply: true, note: r.body.slice(0, 140) });
    }
  }
  return events;
}
